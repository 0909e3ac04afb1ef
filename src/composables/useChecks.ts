import type { CheckStatus, TrayState } from '../../shared/types/rating';
import type { ReviewStatus } from '../../shared/types/runs';
import { quantityOfEngineUnit, type QuantityId } from '../../shared/units';
import { palette } from '../theme/palette';

export { CHECK_LABELS, CHECK_SHORT, REVIEW_LABELS, STATUS_LABELS, TRAY_STATE_LABELS } from '../../shared/labels';

/** CSS class per status (colours in src/css/app.scss). */
export const statusClass = (s: CheckStatus | TrayState): string => `fl-status-${s}`;
/** Quasar colour per status for chips and bars. */
export const STATUS_COLORS: Record<CheckStatus, string> = { ok: 'primary', near: 'secondary', over: 'negative', na: 'grey-6' };
/** Hex colours per status for charts (same as app.scss). */
export const STATUS_HEX: Record<CheckStatus, string> = {
  ok: palette.primary,
  near: palette.near,
  over: palette.negative,
  na: palette.muted,
};

export const REVIEW_COLORS: Record<ReviewStatus, string> = {
  draft: 'grey-7',
  submitted: 'info',
  approved: 'positive',
  returned: 'warning',
};

/** Quantity for a check's value (for unit conversion); '% of (TS + hw)' stays a percent. */
export function checkQuantity(unit: string): QuantityId {
  return quantityOfEngineUnit(unit);
}

/** Unit text for a check value in a unit system. */
export function checkUnit(unit: string, label: (q: QuantityId) => string): string {
  const q = quantityOfEngineUnit(unit);
  if (q === 'percent') return unit === '%' ? '%' : unit;
  if (q === 'ratio') return unit === '-' ? 'ratio' : unit;
  return label(q);
}
