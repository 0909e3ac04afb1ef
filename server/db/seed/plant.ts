import type { EntityManager } from 'typeorm';
import { ProcessUnit, Site, SiteMember, TowerColumn, User } from '../entities/index.js';

/**
 * The invented demo plant: Marrowby Point refinery (fictional), crude unit CU-7,
 * atmospheric crude column T-701 with 46 trays numbered top-down.
 */
export async function seedPlant(
  em: EntityManager,
  users: User[],
): Promise<{ site: Site; unit: ProcessUnit; column: TowerColumn }> {
  const site = await em.save(Site, em.create(Site, { name: 'Marrowby Point Refinery', location: 'Fictional coastal site' }));
  const unit = await em.save(ProcessUnit, em.create(ProcessUnit, { siteId: site.id, name: 'CU-7 Crude Unit' }));
  const engineer = users.find((u) => u.role === 'process-engineer');
  const column = await em.save(
    TowerColumn,
    em.create(TowerColumn, {
      unitId: unit.id,
      tag: 'T-701',
      service: 'Atmospheric crude column',
      numbering: 'top-down',
      trayCount: 46,
      engineerId: engineer?.id ?? null,
    }),
  );
  for (const u of users) await em.insert(SiteMember, { siteId: site.id, userId: u.id });
  return { site, unit, column };
}
