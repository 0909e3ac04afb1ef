/** What the scan-import page asks about a scan (values as typed, in the user's unit system). */
export interface ScanImportFormModel {
  title: string;
  takenOn: string;
  operatingCase: string;
  chord: string;
  datumTray: number | null;
  /** deck elevation of the datum tray on the scan's scale, in the user's length unit */
  datumElevation: number | null;
  liquidDensity: number | null;
  vapourDensity: number | null;
  vapourCountRate: number | null;
  liquidCountRate: number | null;
}
