/**
 * Limits of the tray-profile import (CSV or XLSX upload), shared by the server (enforced while the file is read)
 * and the client (said on the page). A tray profile is one row per tray or stage: a few hundred rows and a dozen
 * columns; the limits leave a wide margin above that and keep one upload's memory to a few tens of MB.
 */
export const IMPORT_LIMITS = {
  /** rows read from the file (header included); further rows are cut and the preview says where */
  rows: 5000,
  /** columns in any row; a wider row refuses the file */
  columns: 200,
  /** characters in one cell; a longer cell refuses the file, naming its row and column */
  cellChars: 500,
  /** characters of text kept from the whole sheet; the rest is cut like rows past the row limit */
  totalChars: 4_000_000,
  /** data rows returned in a preview (the stored preview keeps every row read) */
  previewRows: 20,
  /** characters of each cell returned in a preview */
  previewCellChars: 100,
  /** row errors listed in a preview, check or refused commit (the count says how many there are) */
  listedErrors: 500,
  /** minutes a preview can be committed by its token */
  previewMinutes: 30,
} as const;
