import { sectionGeometrySchema, valveDataSchema } from '../../shared/schemas/ratingRequest';
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

/** Geometry fields in the order a tray data sheet lists them. */
export const GEOMETRY_FIELDS: NumericField[] = [
  field(G, 'columnDiameter_m', 'Column diameter', 'lengthLarge'),
  field(G, 'traySpacing_mm', 'Tray spacing', 'lengthSmall'),
  field(G, 'activeArea_m2', 'Active (bubbling) area', 'area', { hint: 'per tray, all passes' }),
  field(G, 'downcomerTopArea_m2', 'Downcomer area, top', 'area'),
  field(G, 'downcomerBottomArea_m2', 'Downcomer area, bottom', 'area'),
  field(G, 'outletWeirLength_m', 'Outlet weir length', 'lengthLarge', { hint: 'all passes' }),
  field(G, 'weirHeight_mm', 'Outlet weir height', 'lengthSmall'),
  field(G, 'downcomerClearance_mm', 'Downcomer clearance', 'lengthSmall'),
  field(G, 'holeArea_m2', 'Hole (open) area', 'area'),
  field(G, 'holeDiameter_mm', 'Hole diameter', 'lengthSmall'),
  field(G, 'slotArea_m2', 'Valve slot area, all open', 'area', {
    hint: 'valve trays: curtain area of all valves fully open',
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
  field(V, 'count', 'Valves per tray', 'ratio'),
  field(V, 'orificeDiameter_mm', 'Valve orifice diameter', 'lengthSmall'),
  field(V, 'valveThickness_mm', 'Valve thickness', 'lengthSmall'),
  field(V, 'materialDensity_kg_m3', 'Valve material density', 'density'),
  field(V, 'legFactor', 'Leg factor (with / without legs)', 'ratio'),
];
