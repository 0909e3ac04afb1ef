/**
 * Checks of a pump-around study input that a JSON Schema cannot express: each section's physics (the
 * rating request's own checks), tray ranges, the pump-around's place in the column and the sweep's order.
 * Runs after the schema check. Errors use the rating request's form: a JSON-pointer path and a message
 * that starts with the field (and the tray, for tray entries).
 */
import type { StudyInput, StudySection } from '../../../shared/types/pumpAround.js';
import type { SectionGeometry } from '../../../shared/types/rating.js';
import { physicsErrors, type FieldError } from '../index.js';
import { sectionForTray } from './column.js';
import { topDownPosition } from './traffic.js';

const lo = (s: StudySection): number => Math.min(s.fromTray, s.toTray);
const hi = (s: StudySection): number => Math.max(s.fromTray, s.toTray);

function geometry(s: StudySection): SectionGeometry {
  const { name: _n, fromTray: _f, toTray: _t, ...g } = s;
  return g;
}

export function studyInputFaults(input: StudyInput): FieldError[] {
  const faults: FieldError[] = [];
  const add = (path: string, message: string): void => {
    faults.push({ path, message: `${path.split('/').pop()}: ${message}` });
  };
  const numbering = input.numbering ?? 'top-down';
  const { sections, trays, pumpAround: pa, sweep } = input;

  sections.forEach((s, i) => {
    for (const e of physicsErrors({ section: geometry(s), trays: [] }))
      faults.push({ path: e.path.replace(/^\/section\//, `/sections/${i}/`), message: `section "${s.name}", ${e.message}` });
    sections.slice(0, i).forEach((o) => {
      if (lo(s) <= hi(o) && lo(o) <= hi(s))
        add(
          `/sections/${i}/fromTray`,
          `trays ${lo(s)}–${hi(s)} of section "${s.name}" overlap section "${o.name}" (trays ${lo(o)}–${hi(o)})`,
        );
    });
  });
  // tray-entry physics (vapour lighter than liquid, duplicates), with the first section's geometry
  for (const e of physicsErrors({ section: geometry(sections[0]!), trays })) if (e.path.startsWith('/trays/')) faults.push(e);

  const first = Math.min(...sections.map(lo));
  const last = Math.max(...sections.map(hi));
  trays.forEach((t, i) => {
    if (!sectionForTray(sections, t.tray))
      faults.push({
        path: `/trays/${i}/tray`,
        message: `tray ${t.tray}, tray: is not inside any section (sections cover trays ${first}–${last})`,
      });
  });

  for (const key of ['drawTray', 'returnTray'] as const) {
    if (!sectionForTray(sections, pa[key]))
      add(`/pumpAround/${key}`, `tray ${pa[key]} is outside the column's sections (trays ${first}–${last})`);
  }
  const pR = topDownPosition(pa.returnTray, numbering);
  const pD = topDownPosition(pa.drawTray, numbering);
  if (pR >= pD) {
    const sense =
      numbering === 'top-down' ? 'a lower number, trays numbered top-down' : 'a higher number, trays numbered bottom-up';
    add('/pumpAround/returnTray', `must be above the draw tray ${pa.drawTray} (${sense}); got ${pa.returnTray}`);
  } else if (!trays.some((t) => topDownPosition(t.tray, numbering) < pR)) {
    add('/trays', `no tray loads above the return tray ${pa.returnTray}: the study needs the trays above the pump-around zone`);
  }

  const hasDT = pa.returnTemperatureDrop_K !== undefined;
  const hasM = pa.circulation_kg_h !== undefined;
  if (hasDT && hasM) add('/pumpAround/circulation_kg_h', 'give either returnTemperatureDrop_K or circulation_kg_h, not both');
  if (!hasDT && !hasM) add('/pumpAround/returnTemperatureDrop_K', 'is required unless circulation_kg_h is given');

  if (sweep.toDuty_kW < sweep.fromDuty_kW)
    add('/sweep/toDuty_kW', `must not be below fromDuty_kW (${sweep.fromDuty_kW} kW); got ${sweep.toDuty_kW}`);
  return faults;
}
