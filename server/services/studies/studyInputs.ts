/**
 * The engine's StudyInput for a stored study, built from the column's stored data: its tray sections
 * (geometry and tray range), a base load case (per-tray loads) and one of its pump-arounds (draw, return,
 * base duty), with λ, c_p, ΔT or circulation, the sweep, the margin and method options from the request.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { ValidationError } from '../../errors.js';
import type { TrayLoad } from '../../../shared/types/rating.js';
import type { PumpAroundSpec, StudyInput, StudySection } from '../../../shared/types/pumpAround.js';
import { netZoneLiquid } from '../../engine/pumpAround/index.js';
import type { PumpAroundRecord, TraySectionRecord, TrayNumbering } from '../../../shared/types/columns.js';
import type { CreateStudyBody } from '../../../shared/types/studies.js';

export interface StudyParts {
  column: { id: string; tag: string; numbering: TrayNumbering };
  sections: Pick<TraySectionRecord, 'name' | 'firstTray' | 'lastTray' | 'geometry'>[];
  loadCase: { id: string; name: string; loads: TrayLoad[] };
  pumpAround: Pick<PumpAroundRecord, 'id' | 'name' | 'drawTray' | 'returnTray' | 'baseDuty_kW'>;
}

/** Column, sections, load case and pump-around; the ids must belong to the column (else 400 naming the field). */
export async function loadStudyParts(
  db: DataSource | EntityManager,
  columnId: string,
  loadCaseId: string,
  pumpAroundId: string,
): Promise<StudyParts> {
  const [column] = await db.query<StudyParts['column'][]>(`SELECT id, tag, numbering FROM columns WHERE id = $1`, [columnId]);
  const sections = await db.query<StudyParts['sections']>(
    `SELECT name, first_tray AS "firstTray", last_tray AS "lastTray", geometry FROM tray_sections WHERE column_id = $1 ORDER BY first_tray`,
    [columnId],
  );
  const [loadCase] = await db.query<StudyParts['loadCase'][]>(
    `SELECT id, name, loads FROM load_cases WHERE id = $1 AND column_id = $2`,
    [loadCaseId, columnId],
  );
  const [pumpAround] = await db.query<StudyParts['pumpAround'][]>(
    `SELECT id, name, draw_tray AS "drawTray", return_tray AS "returnTray", base_duty_kw::float8 AS "baseDuty_kW" FROM pump_arounds WHERE id = $1 AND column_id = $2`,
    [pumpAroundId, columnId],
  );
  const errors = [];
  if (!loadCase) errors.push({ path: 'loadCaseId', message: 'is not a load case of this column' });
  if (!pumpAround) errors.push({ path: 'pumpAroundId', message: 'is not a pump-around of this column' });
  if (!sections.length)
    errors.push({ path: 'column sections', message: 'the column has no tray sections: add its tray geometry first' });
  if (errors.length || !column || !loadCase || !pumpAround)
    throw new ValidationError('The study cannot be built from this column', errors);
  return { column, sections, loadCase, pumpAround };
}

/**
 * Zone liquid without the base circulation (the engine's netZoneLiquid); a zone tray whose liquid is below
 * the base circulation is a 400 naming zoneLiquidIncludesCirculation.
 */
export function netZoneLiquidOf(
  trays: TrayLoad[],
  pa: PumpAroundSpec,
  numbering: TrayNumbering,
): { trays: TrayLoad[]; m0: number } {
  const net = netZoneLiquid(trays, pa, numbering);
  const short = net.shortTrays;
  if (short.length)
    throw new ValidationError('The zone liquid cannot carry the base circulation', [
      {
        path: 'zoneLiquidIncludesCirculation',
        message: `the base circulation ${Math.round(net.m0)} kg/h exceeds the liquid of zone tray${short.length > 1 ? 's' : ''} ${short.map((t) => `${t.tray} (${Math.round(t.liquidMassFlow_kg_h)} kg/h)`).join(', ')}`,
      },
    ]);
  return { trays: net.trays, m0: net.m0 };
}

/** The engine input; load-case trays outside every section are left out (and listed). */
export function studyInputFrom(
  parts: StudyParts,
  body: CreateStudyBody,
): { input: StudyInput; excludedTrays: number[]; netOfCirculation_kg_h: number | null } {
  const sections: StudySection[] = parts.sections.map((s) => ({
    ...s.geometry,
    name: s.name,
    fromTray: s.firstTray,
    toTray: s.lastTray,
  }));
  const inside = (tray: number): boolean => parts.sections.some((s) => tray >= s.firstTray && tray <= s.lastTray);
  const pa = parts.pumpAround;
  const input: StudyInput = {
    sections,
    trays: parts.loadCase.loads.filter((t) => inside(t.tray)),
    pumpAround: {
      name: pa.name,
      drawTray: pa.drawTray,
      returnTray: pa.returnTray,
      baseDuty_kW: body.baseDuty_kW ?? pa.baseDuty_kW,
      liquidHeatCapacity_kJ_kgK: body.liquidHeatCapacity_kJ_kgK!,
      ...(body.returnTemperatureDrop_K !== undefined ? { returnTemperatureDrop_K: body.returnTemperatureDrop_K } : {}),
      ...(body.circulation_kg_h !== undefined ? { circulation_kg_h: body.circulation_kg_h } : {}),
    },
    latentHeat_kJ_kg: body.latentHeat_kJ_kg,
    margin: body.margin ?? 0.7,
    sweep: body.sweep,
    numbering: parts.column.numbering,
    ...(body.methods ? { methods: body.methods } : {}),
  };
  let netOfCirculation_kg_h: number | null = null;
  if (body.zoneLiquidIncludesCirculation) {
    const net = netZoneLiquidOf(input.trays, input.pumpAround, input.numbering ?? 'top-down');
    input.trays = net.trays;
    netOfCirculation_kg_h = net.m0;
  }
  return { input, excludedTrays: parts.loadCase.loads.filter((t) => !inside(t.tray)).map((t) => t.tray), netOfCirculation_kg_h };
}
