/** Words for checks, statuses and review states, shared by the pages and the server's reports and exports. */
import type { CheckName, CheckStatus } from './types/rating.js';
import type { ReviewStatus } from './types/runs.js';

/** Our own names for the checks (trade terms). */
export const CHECK_LABELS: Record<CheckName, string> = {
  jetFlood: 'Jet flood',
  entrainment: 'Entrainment',
  weeping: 'Weep margin',
  pressureDrop: 'Tray ΔP',
  weirLoading: 'Weir loading',
  liquidLoad: 'Weir crest',
  downcomerBackup: 'Downcomer backup',
  downcomerInletVelocity: 'Downcomer inlet velocity',
  downcomerResidenceTime: 'Downcomer residence',
  downcomerSeal: 'Downcomer seal',
};

/** Short column headers for dense tables. */
export const CHECK_SHORT: Record<CheckName, string> = {
  jetFlood: 'Flood',
  entrainment: 'Entr.',
  weeping: 'Weep',
  pressureDrop: 'ΔP',
  weirLoading: 'Weir load',
  liquidLoad: 'Crest',
  downcomerBackup: 'DC backup',
  downcomerInletVelocity: 'DC inlet',
  downcomerResidenceTime: 'DC resid.',
  downcomerSeal: 'DC seal',
};

/** Status words of our own: within the limit, close to it, beyond it. */
export const STATUS_LABELS: Record<CheckStatus, string> = { ok: 'within', near: 'close', over: 'beyond' };
export const REVIEW_LABELS: Record<ReviewStatus, string> = {
  draft: 'Working copy',
  submitted: 'Awaiting review',
  approved: 'Approved',
  returned: 'Returned',
};
