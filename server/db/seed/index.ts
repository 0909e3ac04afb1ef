import 'reflect-metadata';
import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import { config } from '../../config.js';
import { makeDataSource } from '../data-source.js';
import { User } from '../entities/User.js';
import { DEMO_PASSWORD, DEMO_USERS } from './demoUsers.js';
import { seedDemoScenario } from './demoScenario.js';
import { seedEvidence } from './evidence.js';
import { seedInspection } from './inspection.js';
import { seedPlant } from './plant.js';
import { seedStudy } from './study.js';
import { seedHeatPlan } from './heatPlan.js';

/** Seed the invented demo scenario once: skipped when the demo admin already exists. */
export async function seedDemo(ds: DataSource): Promise<boolean> {
  if (await ds.getRepository(User).findOneBy({ email: DEMO_USERS[0]!.email })) return false;
  await ds.transaction(async (em) => {
    const hash = await bcrypt.hash(DEMO_PASSWORD, config.bcryptRounds);
    const users: User[] = [];
    for (const u of DEMO_USERS) users.push(await em.save(User, em.create(User, { ...u, passwordHash: hash })));
    const plant = await seedPlant(em, users);
    await seedDemoScenario(em, plant.column, users);
    await seedInspection(em, plant.column.id, users);
    await seedStudy(em, plant.column.id, users);
    await seedHeatPlan(em, plant.column.id, users);
    await seedEvidence(em, plant.column, users);
    // Later seed steps (sections, load cases, runs, inspections) hang off the demo plant here.
    void plant;
  });
  return true;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const ds = makeDataSource();
  ds.initialize()
    .then(async () => {
      const seeded = await seedDemo(ds);
      console.log(seeded ? 'Demo data seeded' : 'Demo data already present');
      await ds.destroy();
    })
    .catch((err: unknown) => {
      console.error(err);
      process.exit(1);
    });
}
