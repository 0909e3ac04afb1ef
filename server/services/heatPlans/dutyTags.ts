/**
 * Pump-around duty tags of a load case (issue 17): the duties a simulation case was made at. A heat-recovery
 * plan uses two or more cases tagged with the duties of its pump-arounds to calibrate its traffic model.
 */
import type { DataSource, EntityManager } from 'typeorm';
import { LoadCase } from '../../db/entities/LoadCase.js';
import { ValidationError, type ErrorDetail } from '../../errors.js';
import { audit } from '../audit/audit.js';
import { assertVersion, visibleChild } from '../columns/columnsCommon.js';
import type { SessionUser } from '../../../shared/types/api.js';
import type { LoadCaseDutyTags, PutPumpAroundDutiesBody } from '../../../shared/types/heatPlans.js';
import type { PumpAroundDutyTag } from '../../../shared/types/loads.js';

/** Each tag must name one of the column's pump-arounds, once; errors under `field` (`duties.0.pumpAroundId`). */
export async function dutyTagErrors(
  em: EntityManager,
  columnId: string,
  duties: readonly PumpAroundDutyTag[],
  field: string,
): Promise<ErrorDetail[]> {
  if (!duties.length) return [];
  const own = new Set(
    (await em.query<{ id: string }[]>(`SELECT id FROM pump_arounds WHERE column_id = $1`, [columnId])).map((r) => r.id),
  );
  const seen = new Set<string>();
  return duties.flatMap((d, i) => {
    const path = `${field}.${i}.pumpAroundId`;
    if (!own.has(d.pumpAroundId)) return [{ path, message: 'is not a pump-around of this column' }];
    if (seen.has(d.pumpAroundId)) return [{ path, message: 'is tagged twice; give each pump-around once' }];
    seen.add(d.pumpAroundId);
    return [];
  });
}

/** Replace a load case's duty tags; each pump-around must be the column's and appear once (400 naming the field). */
export async function putPumpAroundDuties(
  ds: DataSource,
  user: SessionUser,
  id: string,
  body: PutPumpAroundDutiesBody,
): Promise<LoadCaseDutyTags> {
  return ds.transaction(async (em) => {
    const l = await visibleChild(em, user, LoadCase, id, 'Load case', true);
    assertVersion('load case', l.version, body.version);
    const errors = await dutyTagErrors(em, l.columnId, body.duties, 'duties');
    if (errors.length) throw new ValidationError('Invalid pump-around duties', errors);
    l.pumpAroundDuties = body.duties.map((d) => ({ pumpAroundId: d.pumpAroundId, duty_kW: d.duty_kW }));
    const saved = await em.save(LoadCase, l);
    await audit(em, user.id, 'update-duties', 'load-case', id, {
      duties: l.pumpAroundDuties,
      previous: { version: body.version },
    });
    return { id: saved.id, pumpAroundDuties: saved.pumpAroundDuties, version: saved.version };
  });
}
