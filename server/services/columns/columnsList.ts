import type { DataSource } from 'typeorm';
import { siteFilterSql } from '../access/access.js';
import type { Page, SessionUser } from '../../../shared/types/api.js';
import type { ColumnSummary } from '../../../shared/types/columns.js';

interface Row {
  id: string;
  tag: string;
  service: string;
  numbering: ColumnSummary['numbering'];
  tray_count: number;
  site_id: string;
  site_name: string;
  unit_id: string;
  unit_name: string;
  engineer_id: string | null;
  version: number;
  updated_at: Date;
  total: string;
}

/** Columns the user may see, searched by tag, service, unit or site, filtered by site or unit, paged. */
export async function listVisibleColumns(
  ds: DataSource,
  user: SessionUser,
  q: { page: number; pageSize: number; q?: string; siteId?: string; unitId?: string },
): Promise<Page<ColumnSummary>> {
  const f = siteFilterSql(user, 's.id', 1);
  const params: unknown[] = [...f.params];
  let search = '';
  if (q.q) {
    params.push(`%${q.q.replace(/[%_\\]/g, (m) => `\\${m}`)}%`);
    const i = params.length;
    search = `AND (c.tag ILIKE $${i} OR c.service ILIKE $${i} OR u.name ILIKE $${i} OR s.name ILIKE $${i})`;
  }
  if (q.siteId) {
    params.push(q.siteId);
    search += ` AND s.id = $${params.length}`;
  }
  if (q.unitId) {
    params.push(q.unitId);
    search += ` AND u.id = $${params.length}`;
  }
  params.push(q.pageSize, (q.page - 1) * q.pageSize);
  const rows = await ds.query<Row[]>(
    `SELECT c.id, c.tag, c.service, c.numbering, c.tray_count, s.id AS site_id, s.name AS site_name,
            u.id AS unit_id, u.name AS unit_name, c.engineer_id, c.version, c.updated_at,
            count(*) OVER () AS total
       FROM columns c JOIN process_units u ON u.id = c.unit_id JOIN sites s ON s.id = u.site_id
      WHERE ${f.sql} ${search}
      ORDER BY s.name, u.name, c.tag
      LIMIT $${params.length - 1} OFFSET $${params.length}`,
    params,
  );
  return {
    items: rows.map((r) => ({
      id: r.id,
      tag: r.tag,
      service: r.service,
      numbering: r.numbering,
      trayCount: r.tray_count,
      siteId: r.site_id,
      siteName: r.site_name,
      unitId: r.unit_id,
      unitName: r.unit_name,
      engineerId: r.engineer_id,
      version: r.version,
      updatedAt: new Date(r.updated_at).toISOString(),
    })),
    total: rows[0] ? Number(rows[0].total) : 0,
    page: q.page,
    pageSize: q.pageSize,
  };
}
