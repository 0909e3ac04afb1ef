import type { CheckStatus, TrayState } from '../../shared/types/rating';
import type { ReviewStatus } from '../../shared/types/runs';
import { quantityOfEngineUnit, type QuantityId } from '../../shared/units';

export { CHECK_LABELS, CHECK_SHORT, REVIEW_LABELS, STATUS_LABELS, TRAY_STATE_LABELS } from '../../shared/labels';

/** CSS class per status (colours in src/css/app.scss). */
export const statusClass = (s: CheckStatus | TrayState): string => `fl-status-${s}`;

export const REVIEW_COLORS: Record<ReviewStatus, string> = {
  draft: 'grey-7',
  submitted: 'info',
  approved: 'positive',
  returned: 'warning',
};

/** Unit text for a check value in a unit system. */
export function checkUnit(unit: string, label: (q: QuantityId) => string): string {
  const q = quantityOfEngineUnit(unit);
  if (q === 'percent') return unit === '%' ? '%' : unit;
  if (q === 'ratio') return unit === '-' ? 'ratio' : unit;
  return label(q);
}
