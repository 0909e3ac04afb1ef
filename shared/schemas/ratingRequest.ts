/**
 * JSON Schema (draft-07) of a rating request, the one declaration of its fields: shared/types/rating.ts
 * derives RatingRequest and its parts from these objects (json-schema-to-ts FromSchema), and the field
 * descriptions travel into the published OpenAPI document. Used with ajv 8
 * (`new Ajv({ useDefaults: true, allErrors: true })`) by the engine's validateRatingRequest, the API and
 * the CLI. Unknown fields are rejected. Bounds are physical plausibility limits that also keep every
 * engine output finite; physics consistency (densities, areas) is checked after the schema.
 */
import type { CheckName } from '../types/rating.js';

const positive = (maximum: number) => ({ type: 'number', exclusiveMinimum: 0, maximum }) as const;
const nonNegative = (maximum: number) => ({ type: 'number', minimum: 0, maximum }) as const;

export const valveDataSchema = {
  type: 'object',
  additionalProperties: false,
  required: ['count', 'orificeDiameter_mm', 'valveThickness_mm', 'materialDensity_kg_m3', 'legFactor', 'orificeShape'],
  properties: {
    count: { type: 'integer', minimum: 1, maximum: 1000000 },
    orificeDiameter_mm: { type: 'number', minimum: 5, maximum: 200 },
    valveThickness_mm: { type: 'number', minimum: 0.2, maximum: 10 },
    materialDensity_kg_m3: { type: 'number', minimum: 1000, maximum: 25000 },
    legFactor: {
      type: 'number',
      minimum: 1,
      maximum: 2,
      description: 'weight with legs / weight without legs (Klein 1982, R_vw)',
    },
    orificeShape: { type: 'string', enum: ['flat', 'venturi'] },
  },
} as const;

/**
 * Layout of a two- or four-pass tray, symmetric about the column axis, with vertical downcomers (the
 * top widths bound the pass panels). Widths are measured across the flow direction at the tray deck.
 */
export const passLayoutSchema = {
  type: 'object',
  additionalProperties: false,
  required: ['sideDowncomerWidth_mm', 'centreDowncomerWidth_mm', 'oddTrayOutlets'],
  properties: {
    sideDowncomerWidth_mm: { ...positive(10000), description: 'width of each side downcomer, shell to weir [mm]' },
    centreDowncomerWidth_mm: { ...positive(10000), description: 'full width of the centre downcomer [mm]' },
    offCentreDowncomerWidth_mm: {
      ...positive(10000),
      description: 'four-pass: full width of each off-centre downcomer [mm]',
    },
    offCentreDowncomerOffset_mm: {
      ...positive(10000),
      description: "four-pass: distance from the column axis to each off-centre downcomer's centre line [mm]",
    },
    // Two-pass: 'side' = to the two side downcomers, 'inner' = to the centre downcomer. Four-pass: 'side' =
    // to the side downcomers and the centre downcomer, 'inner' = to the two off-centre downcomers.
    oddTrayOutlets: {
      type: 'string',
      enum: ['side', 'inner'],
      description: 'where the odd-numbered trays drain; trays alternate, so the even-numbered ones drain to the other downcomers',
    },
    liquidSplit: {
      type: 'array',
      minItems: 2,
      maxItems: 4,
      items: { type: 'number', exclusiveMinimum: 0, maximum: 1 },
      description:
        "fraction of the tray's liquid in each pass, across the tray from one shell wall to the other (one entry per pass, summing to 1); absent: equal split",
    },
  },
} as const;

export const sectionGeometrySchema = {
  type: 'object',
  additionalProperties: false,
  required: [
    'trayType',
    'passes',
    'columnDiameter_m',
    'traySpacing_mm',
    'activeArea_m2',
    'downcomerTopArea_m2',
    'downcomerBottomArea_m2',
    'outletWeirLength_m',
    'weirHeight_mm',
    'downcomerClearance_mm',
    'holeArea_m2',
    'holeDiameter_mm',
    'deckThickness_mm',
  ],
  properties: {
    trayType: { type: 'string', enum: ['sieve', 'fixed-valve', 'moving-valve'] },
    passes: { type: 'integer', enum: [1, 2, 4] },
    passLayout: {
      ...passLayoutSchema,
      description: 'two- and four-pass trays: the pass layout; absent, passes are rated as equal shares of the totals',
    },
    columnDiameter_m: { type: 'number', minimum: 0.1, maximum: 20 },
    traySpacing_mm: { type: 'number', minimum: 100, maximum: 1200 },
    activeArea_m2: positive(320),
    downcomerTopArea_m2: positive(320),
    downcomerBottomArea_m2: positive(320),
    outletWeirLength_m: positive(100),
    weirHeight_mm: nonNegative(300),
    downcomerClearance_mm: { type: 'number', minimum: 1, maximum: 600 },
    holeArea_m2: { type: 'number', minimum: 1e-6, maximum: 320 },
    holeDiameter_mm: { type: 'number', minimum: 1, maximum: 200 },
    deckThickness_mm: nonNegative(20),
    systemFactor: { type: 'number', exclusiveMinimum: 0, maximum: 1.5, default: 1 },
    foaming: { type: 'string', enum: ['low', 'moderate', 'high', 'very-high'], default: 'moderate' },
    valves: valveDataSchema,
    slotArea_m2: {
      type: 'number',
      minimum: 1e-6,
      maximum: 320,
      description:
        "valve trays: open slot (curtain) area of all valves fully open [m²], the vertical opening through which vapour leaves the valves; gives the fractional open area A_f of the flood correlations (Perry's 8th ed.)",
    },
    orificeCoefficient: {
      type: 'number',
      minimum: 0.3,
      maximum: 1.2,
      description: "measured or vendor dry-tray orifice coefficient C_v (sieve trays); overrides the Hughmark & O'Connell fit",
    },
  },
} as const;

export const trayLoadSchema = {
  type: 'object',
  additionalProperties: false,
  required: [
    'tray',
    'vapourMassFlow_kg_h',
    'liquidMassFlow_kg_h',
    'vapourDensity_kg_m3',
    'liquidDensity_kg_m3',
    'surfaceTension_mN_m',
  ],
  properties: {
    tray: { type: 'integer', minimum: 0, maximum: 100000 },
    vapourMassFlow_kg_h: nonNegative(1e8),
    liquidMassFlow_kg_h: nonNegative(1e8),
    vapourDensity_kg_m3: { type: 'number', minimum: 0.001, maximum: 1000 },
    liquidDensity_kg_m3: { type: 'number', minimum: 50, maximum: 3000 },
    surfaceTension_mN_m: { type: 'number', minimum: 0.1, maximum: 500 },
    liquidViscosity_mPa_s: nonNegative(10000),
    temperature_C: { type: 'number', minimum: -273.15, maximum: 1500 },
    pressure_kPa: positive(100000),
  },
} as const;

const limit = { type: 'number', minimum: 0, maximum: 1e9 } as const;
/** One limit override per check name (`satisfies` holds the keys equal to CHECK_NAMES). */
const limitProperties = {
  jetFlood: limit,
  entrainment: limit,
  weeping: limit,
  pressureDrop: limit,
  weirLoading: limit,
  liquidLoad: limit,
  downcomerBackup: limit,
  downcomerInletVelocity: limit,
  downcomerResidenceTime: limit,
  downcomerSeal: limit,
} as const satisfies Record<CheckName, typeof limit>;

export const methodOptionsSchema = {
  type: 'object',
  additionalProperties: false,
  properties: {
    jetFlood: { type: 'string', enum: ['fair', 'kister-haas'], default: 'fair' },
    limits: {
      type: 'object',
      additionalProperties: false,
      properties: limitProperties,
      description: 'limit overrides, keyed by check name',
    },
    nearFraction: {
      type: 'number',
      exclusiveMinimum: 0,
      maximum: 1,
      default: 0.9,
      description: "fraction of a limit at which status becomes 'near'",
    },
  },
  default: {},
} as const;

export const ratingRequestSchema = {
  $schema: 'http://json-schema.org/draft-07/schema#',
  title: 'Tray section rating request',
  type: 'object',
  additionalProperties: false,
  required: ['section', 'trays'],
  properties: {
    section: sectionGeometrySchema,
    trays: { type: 'array', minItems: 1, maxItems: 2000, items: trayLoadSchema },
    methods: methodOptionsSchema,
  },
} as const;
