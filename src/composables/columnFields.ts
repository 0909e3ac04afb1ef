import { TRAY_NUMBER } from '../../shared/contract/sections';

/** Choices and input rules shared by the column create and edit forms (bounds from the API schema). */
export const NUMBERING_OPTIONS = [
  { label: 'Top-down (tray 1 at the top)', value: 'top-down' },
  { label: 'Bottom-up (tray 1 at the bottom)', value: 'bottom-up' },
];

const { minimum, maximum } = TRAY_NUMBER;

export const trayCountRules = [
  (v: number | string) => (v !== '' && v !== null && Number.isFinite(Number(v))) || 'Number of trays is required',
  (v: number | string) => Number.isInteger(Number(v)) || 'Enter a whole number of trays',
  (v: number | string) => (Number(v) >= minimum && Number(v) <= maximum) || `Between ${minimum} and ${maximum} trays`,
];
