export type TrayNumbering = 'top-down' | 'bottom-up';

export interface ColumnSummary {
  id: string;
  tag: string;
  service: string;
  numbering: TrayNumbering;
  trayCount: number;
  siteId: string;
  siteName: string;
  unitId: string;
  unitName: string;
  engineerId: string | null;
  version: number;
  updatedAt: string;
}
