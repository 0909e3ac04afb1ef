import { passLayoutSchema, sectionGeometrySchema, valveDataSchema } from '../../shared/schemas/ratingRequest';
import type { QuantityId } from '../../shared/units';

/** A numeric geometry field: its SI bounds come from the shared JSON schema (one source of truth). */
export interface NumericField {
  key: string;
  label: string;
  quantity: QuantityId;
  hint?: string;
  optional?: boolean;
  integer?: boolean;
  min: number;
  max: number;
  /** true when the lower bound itself is not allowed */
  exclusiveMin: boolean;
}

type Bound = { minimum?: number; exclusiveMinimum?: number; maximum?: number; type?: string };
function field(
  schema: Record<string, Bound>,
  key: string,
  label: string,
  quantity: QuantityId,
  extra: Partial<NumericField> = {},
): NumericField {
  const b = schema[key];
  if (!b) throw new Error(`schema has no field ${key}`);
  return {
    key,
    label,
    quantity,
    min: b.minimum ?? b.exclusiveMinimum ?? 0,
    max: b.maximum ?? Number.MAX_VALUE,
    exclusiveMin: b.exclusiveMinimum !== undefined,
    integer: b.type === 'integer',
    ...extra,
  };
}

const G = sectionGeometrySchema.properties as unknown as Record<string, Bound>;
const V = valveDataSchema.properties as unknown as Record<string, Bound>;
const P = passLayoutSchema.properties as unknown as Record<string, Bound>;

/** Geometry fields in the order a tray data sheet lists them. */
export const GEOMETRY_FIELDS: NumericField[] = [
  field(G, 'columnDiameter_m', 'Column diameter', 'lengthLarge'),
  field(G, 'traySpacing_mm', 'Tray spacing', 'lengthSmall'),
  field(G, 'activeArea_m2', 'Active (bubbling) area, all passes', 'area', { hint: 'per tray' }),
  field(G, 'downcomerTopArea_m2', 'Downcomer area, top, all passes', 'area', { hint: 'the downcomers one tray drains into' }),
  field(G, 'downcomerBottomArea_m2', 'Downcomer area, bottom, all passes', 'area'),
  field(G, 'outletWeirLength_m', 'Outlet weir length, all passes', 'lengthLarge', {
    hint: 'sum of one tray’s outlet weirs; with a pass layout each tray’s own weirs come from the layout',
  }),
  field(G, 'weirHeight_mm', 'Outlet weir height', 'lengthSmall'),
  field(G, 'downcomerClearance_mm', 'Downcomer clearance', 'lengthSmall'),
  field(G, 'holeArea_m2', 'Hole (open) area, all passes', 'area', { hint: 'per tray; valve trays: deck orifices' }),
  field(G, 'holeDiameter_mm', 'Hole diameter', 'lengthSmall'),
  field(G, 'slotArea_m2', 'Valve slot area, all valves open, all passes', 'area', {
    hint: 'valve trays, per tray: curtain area of all valves fully open',
    optional: true,
  }),
  field(G, 'deckThickness_mm', 'Deck thickness', 'lengthSmall'),
  field(G, 'systemFactor', 'System factor', 'ratio', { hint: 'derating, 1 = none', optional: true }),
  field(G, 'orificeCoefficient', 'Dry-tray orifice coefficient', 'ratio', {
    hint: 'optional measured or vendor value',
    optional: true,
  }),
];

export const VALVE_FIELDS: NumericField[] = [
  field(V, 'count', 'Valves per tray, all passes', 'ratio'),
  field(V, 'orificeDiameter_mm', 'Valve orifice diameter', 'lengthSmall'),
  field(V, 'valveThickness_mm', 'Valve thickness', 'lengthSmall'),
  field(V, 'materialDensity_kg_m3', 'Valve material density', 'density'),
  field(V, 'legFactor', 'Leg factor (with / without legs)', 'ratio'),
];

/** Pass layout of two- and four-pass trays (per downcomer; the four-pass fields only for four passes). */
export const PASS_LAYOUT_FIELDS: NumericField[] = [
  field(P, 'sideDowncomerWidth_mm', 'Side downcomer width, each', 'lengthSmall', { hint: 'shell to weir' }),
  field(P, 'centreDowncomerWidth_mm', 'Centre downcomer width', 'lengthSmall', { hint: 'full width' }),
];
export const PASS_LAYOUT_FIELDS_FOUR: NumericField[] = [
  field(P, 'offCentreDowncomerWidth_mm', 'Off-centre downcomer width, each', 'lengthSmall', { hint: 'full width' }),
  field(P, 'offCentreDowncomerOffset_mm', 'Off-centre downcomer position', 'lengthSmall', {
    hint: 'column axis to its centre line',
  }),
];
