/**
 * Demo pump-around study (issue 5): T-701's top pump-around swept from its base duty to a little past the
 * dry-out duty, on the demo base load case, authored by the demo process engineer and sent for review.
 * λ, c_p and ΔT are invented demo values (no plant data); the duties come from the engine. The demo load
 * case's zone liquid includes the circulation, so the study takes the base circulation off first.
 */
import type { EntityManager } from 'typeorm';
import type { User } from '../entities/User.js';
import { dryOutDuty } from '../../engine/pumpAround/index.js';
import { buildStudy, insertStudy } from '../../services/studies/studies.js';
import { PumpAroundStudy } from '../entities/PumpAroundStudy.js';
import { ValidationError } from '../../errors.js';
import type { PumpAroundSpec } from '../../../shared/types/pumpAround.js';
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { CreateStudyBody } from '../../../shared/types/studies.js';

/** invented demo values */
const DEMO_LATENT_HEAT_KJ_KG = 265;
const DEMO_CP_KJ_KGK = 2.6;
const DEMO_RETURN_DROP_K = 110;

export async function seedStudy(em: EntityManager, columnId: string, users: User[]): Promise<PumpAroundStudy | null> {
  const author = users.find((u) => u.role === 'process-engineer');
  const [column] = await em.query<
    {
      numbering: 'top-down' | 'bottom-up';
    }[]
  >(`SELECT numbering FROM columns WHERE id = $1`, [columnId]);
  // the top pump-around: the highest return tray in the column
  const order = column?.numbering === 'bottom-up' ? 'DESC' : 'ASC';
  const [pa] = await em.query<
    {
      id: string;
      name: string;
      draw_tray: number;
      return_tray: number;
      base_duty_kw: number;
    }[]
  >(
    `SELECT id, name, draw_tray, return_tray, base_duty_kw FROM pump_arounds WHERE column_id = $1 ORDER BY return_tray ${order} LIMIT 1`,
    [columnId],
  );
  const [lc] = await em.query<{ id: string; loads: TrayLoad[] }[]>(
    `SELECT id, loads FROM load_cases WHERE column_id = $1 ORDER BY (basis = 'normal') DESC, created_at LIMIT 1`,
    [columnId],
  );
  if (!author || !column || !pa || !lc) return null;
  const spec: PumpAroundSpec = {
    name: pa.name,
    drawTray: pa.draw_tray,
    returnTray: pa.return_tray,
    baseDuty_kW: pa.base_duty_kw,
    liquidHeatCapacity_kJ_kgK: DEMO_CP_KJ_KGK,
    returnTemperatureDrop_K: DEMO_RETURN_DROP_K,
  };
  const dry = dryOutDuty(lc.loads, spec, DEMO_LATENT_HEAT_KJ_KG, column.numbering);
  const to = Math.ceil(((dry?.duty_kW ?? 2 * pa.base_duty_kw) * 1.08) / 100) * 100;
  const body: CreateStudyBody = {
    label: `${pa.name}: how far can the duty go?`,
    loadCaseId: lc.id,
    pumpAroundId: pa.id,
    latentHeat_kJ_kg: DEMO_LATENT_HEAT_KJ_KG,
    liquidHeatCapacity_kJ_kgK: DEMO_CP_KJ_KGK,
    returnTemperatureDrop_K: DEMO_RETURN_DROP_K,
    // the demo load cases carry the circulation on the zone trays, as a rating case does
    zoneLiquidIncludesCirculation: true,
    sweep: { fromDuty_kW: pa.base_duty_kw, toDuty_kW: to, steps: 40 },
    margin: 0.7,
  };
  let built: Awaited<ReturnType<typeof buildStudy>>;
  try {
    built = await buildStudy(em, columnId, body);
  } catch (e) {
    // the demo plant's data did not make a valid study: keep the rest of the demo, say why
    console.warn('Demo pump-around study skipped:', e instanceof ValidationError ? JSON.stringify(e.details) : e);
    return null;
  }
  const row = await insertStudy(em, author.id, body, built);
  const at = new Date().toISOString();
  await em.update(
    PumpAroundStudy,
    { id: row.id },
    {
      status: 'submitted',
      submittedAt: new Date(at),
      reviews: [{ at, userId: author.id, userName: author.name, action: 'submit', comment: '' }],
    },
  );
  return row;
}
