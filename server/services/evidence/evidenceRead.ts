/** Field-evidence records as the API answers them: header, author, linked run and inspection named. */
import type { EntityManager } from 'typeorm';
import type { FieldEvidence } from '../../db/entities/FieldEvidence.js';
import { iso } from '../columns/columnsCommon.js';
import type { EvidenceDataByKind, EvidenceRecord, EvidenceSummary } from '../../../shared/types/evidence.js';

function itemCount(ev: FieldEvidence): number {
  if (ev.kind === 'gamma-scan') return (ev.data as EvidenceDataByKind['gamma-scan']).lines.length;
  return (ev.data as EvidenceDataByKind['dp-survey' | 'temperature-survey']).readings.length;
}

async function authorNames(em: EntityManager, ids: (string | null)[]): Promise<Map<string, string>> {
  const wanted = [...new Set(ids.filter((x): x is string => !!x))];
  if (!wanted.length) return new Map();
  const rows = await em.query<
    {
      id: string;
      name: string;
    }[]
  >(`SELECT id, name FROM users WHERE id = ANY($1::uuid[])`, [wanted]);
  return new Map(rows.map((r) => [r.id, r.name]));
}

function summary(ev: FieldEvidence, authors: Map<string, string>): EvidenceSummary {
  return {
    id: ev.id,
    columnId: ev.columnId,
    kind: ev.kind,
    title: ev.title,
    takenOn: ev.takenOn,
    operatingCase: ev.operatingCase,
    runId: ev.runId,
    inspectionId: ev.inspectionId,
    inspectionTiming: ev.inspectionTiming,
    authorName: ev.authorId ? (authors.get(ev.authorId) ?? null) : null,
    itemCount: itemCount(ev),
    createdAt: iso(ev.createdAt),
  };
}

export async function toEvidenceSummary(em: EntityManager, rows: FieldEvidence[]): Promise<EvidenceSummary[]> {
  const authors = await authorNames(
    em,
    rows.map((r) => r.authorId),
  );
  return rows.map((r) => summary(r, authors));
}

export async function toEvidenceRecord(em: EntityManager, ev: FieldEvidence): Promise<EvidenceRecord> {
  const authors = await authorNames(em, [ev.authorId]);
  const run = ev.runId
    ? (
        await em.query<
          {
            label: string;
            load_case_name: string;
          }[]
        >(`SELECT label, load_case_name FROM rating_runs WHERE id = $1`, [ev.runId])
      )[0]
    : undefined;
  const insp = ev.inspectionId
    ? (
        await em.query<{ turnaround: string; start: string }[]>(
          `SELECT turnaround, to_char(start_date, 'YYYY-MM-DD') AS start FROM inspections WHERE id = $1`,
          [ev.inspectionId],
        )
      )[0]
    : undefined;
  return {
    ...summary(ev, authors),
    data: ev.data,
    notes: ev.notes,
    sourceFile: ev.sourceFile,
    runLabel: run ? (run.load_case_name ? `${run.label} (${run.load_case_name})` : run.label) : null,
    inspectionLabel: insp ? `${insp.turnaround} (from ${insp.start})` : null,
    updatedAt: iso(ev.updatedAt),
    version: ev.version,
  } as EvidenceRecord;
}
