/**
 * Colour values for code that needs them (the client's Plotly charts and SVG attributes, the server's PDF
 * charts and tables), named as in src/css/quasar.variables.scss, where the colours are defined;
 * tests/unit/theme/palette.test.ts keeps the two equal. The client's style blocks use the SCSS variables
 * ($near, $cream …) instead.
 */
import type { CheckStatus } from './types/rating.js';

export const palette = {
  // Quasar's brand colours (also CSS variables: --q-primary …)
  primary: '#16505c',
  secondary: '#d9822b',
  accent: '#6f8f72',
  dark: '#0f2226',
  darkPage: '#0b191c',
  positive: '#2e7d4f',
  negative: '#b3261e',
  info: '#3c6e8f',
  warning: '#c98a00',
  // Check status (ok = primary, over = negative) and their row and flag tints
  near: '#b26a12',
  nearText: '#8a5a12',
  muted: '#8a8a8a',
  dry: '#4a5a78',
  struck: '#757575',
  tintOver: '#fdecea',
  tintNear: '#fff3e0',
  rowOver: '#fbeceb',
  rowDry: '#eceff5',
  rowNear: '#fdf4e7',
  note: '#fff8ee',
  // Surfaces, tables and the load grid
  white: '#ffffff',
  cream: '#f4efe6',
  paper: '#fffdf8',
  sand: '#e6ddcc',
  tableHead: '#f8f4ec',
  gridLine: '#ece6da',
  cellBorder: '#ddd3c2',
  cellBorderStrong: '#c9bca6',
  cellRule: '#efe8dc',
  cellFocus: '#fffaf2',
  cellMuted: '#8a8f90',
  // Chart series
  plum: '#8c4f7a',
  bronze: '#a0692e',
  slate: '#707a80',
  olive: '#5c5c3d',
  lagoon: '#2f8f9d',
  rust: '#8c4a2f',
  rose: '#e07a6f',
  gold: '#f2c14e',
  violet: '#7a5c99',
  fern: '#2f7d5b',
  taupe: '#8a8170',
  umber: '#5c5546',
  ash: '#7a8b8e',
  khaki: '#c7b9a3',
  // Colour scales of the heat-plan map and the study's percent-of-limit chart
  mapCalm: '#e3f0ee',
  mapCalmDeep: '#9cc9c1',
  mapSand: '#f2d29b',
  mapRose: '#e8a59f',
  scaleMist: '#e8f0ef',
  scaleSea: '#7fa9a6',
  scaleOxblood: '#5e120e',
  // Column profile: section fills, trays and labels
  section1: '#dce8e4',
  section2: '#f3e1c9',
  section3: '#e3e8d6',
  section4: '#e6dfee',
  section5: '#d8e3ee',
  profileTray: '#6b7f82',
  profileLabel: '#33484c',
  // Pump-around zone picture
  diagramShell: '#fafafa',
  diagramOutline: '#607d8b',
  diagramTray: '#455a64',
  diagramBand: '#e3f2fd',
  diagramBandIn: '#ffe0b2',
  diagramLoop: '#1565c0',
  diagramInk: '#263238',
} as const;

/** The colour of a check status, as the pages show it (ok = primary, over = negative). */
export const STATUS_COLOURS: Record<CheckStatus, string> = {
  ok: palette.primary,
  near: palette.near,
  over: palette.negative,
  na: palette.muted,
};
