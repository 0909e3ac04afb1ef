/**
 * Demo scenario on T-701 (invented): four tray sections, two pump-arounds, side draws as tray marks,
 * three load cases ('Summer normal'; 'Winter maximum' with jet flood above 100 % on the top trays;
 * 'High top-PA duty' with tray 1 near dry-out, crest below 6 mm) and one rating run per case, the
 * winter run submitted for review.
 */
import type { EntityManager } from 'typeorm';
import { PumpAround, TowerColumn, TraySection, type User } from '../entities/index.js';
import { audit } from '../../services/audit/audit.js';
import { insertLoadCase } from '../../services/loads/loads.js';
import { applyReview } from '../../services/runs/review.js';
import { createRatingRun } from '../../services/runs/runs.js';
import { toSessionUser } from '../../services/auth/users.js';
import { DEMO_PUMP_AROUNDS, DEMO_SECTIONS, DEMO_TRAY_MARKS } from './demoColumn.js';
import { DEMO_LOAD_CASES } from './demoLoads.js';

export async function seedDemoScenario(em: EntityManager, column: TowerColumn, users: User[]): Promise<void> {
  const engineer = users.find((u) => u.role === 'process-engineer') ?? users[0]!;
  const specialist = users.find((u) => u.role === 'internals-specialist') ?? engineer;
  const eng = toSessionUser(engineer);
  column.trayMarks = DEMO_TRAY_MARKS;
  await em.save(TowerColumn, column);
  await audit(em, specialist.id, 'update', 'column', column.id, { trayMarks: DEMO_TRAY_MARKS });
  for (const s of DEMO_SECTIONS) {
    const row = await em.save(
      TraySection,
      em.create(TraySection, {
        ...s,
        notes: s.notes ?? '',
        provenanceDate: s.provenanceDate ?? null,
        columnId: column.id,
        createdBy: specialist.id,
      }),
    );
    await audit(em, specialist.id, 'create', 'tray-section', row.id, s);
  }
  for (const p of DEMO_PUMP_AROUNDS) {
    const row = await em.save(PumpAround, em.create(PumpAround, { ...p, columnId: column.id }));
    await audit(em, specialist.id, 'create', 'pump-around', row.id, p);
  }
  for (const { runLabel, ...body } of DEMO_LOAD_CASES) {
    const lc = await insertLoadCase(em, eng, column.id, body);
    const run = await createRatingRun(em, eng, { columnId: column.id, loadCaseId: lc.id, label: runLabel, kind: 'rating' });
    if (body.basis === 'maximum')
      await applyReview(em, eng, run.id, 'submit', {
        version: run.version,
        comment: 'Top trays over jet flood at winter maximum; please review before the MOC meeting.',
      });
  }
}
