/**
 * Field evidence stored per column (issue 16): gamma scans, pressure-drop surveys and temperature surveys,
 * declared once with TypeBox; the request types come from these schemas (shared/types/evidence.ts).
 * Everything is stored in SI: elevations in m, densities in kg/m³, ΔP in Pa, temperatures in °C. Count rates
 * are kept in the file's own unit (only their ratio to the two calibration rates matters).
 */
import { Type, type TSchema } from '@sinclair/typebox';

export const EVIDENCE_KINDS = ['gamma-scan', 'dp-survey', 'temperature-survey'] as const;
export const SCAN_MEASURES = ['density', 'count-rate'] as const;
export const INSPECTION_TIMINGS = ['before', 'after'] as const;

const text = (max: number, minLength = 0) => Type.String({ minLength, maxLength: max });
const lines = (max: number) => Type.String({ maxLength: max, 'x-text': 'multiline' });
const date = Type.String({ format: 'date' });
const uuid = Type.String({ format: 'uuid' });
const nullable = <T extends TSchema>(t: T) => Type.Union([t, Type.Null()]);
const literals = <T extends string>(xs: readonly T[]) => Type.Union(xs.map((x) => Type.Literal(x)));
/** an elevation on the scan's (or survey's) own scale [m]; columns stand well inside ±500 m of their zero */
const elevation = Type.Number({ minimum: -500, maximum: 500 });

export const datumSchema = Type.Object(
  {
    /** the tray whose deck sits at `elevation_m` on the evidence's elevation scale */
    tray: Type.Integer({ minimum: 1, maximum: 500 }),
    elevation_m: elevation,
    /** the user's adjustment of the datum after reading the scan [m] (positive raises every tray) */
    nudge_m: Type.Number({ minimum: -5, maximum: 5, default: 0 }),
  },
  { additionalProperties: false },
);

export const scanPointSchema = Type.Object(
  {
    elevation_m: elevation,
    /** density [kg/m³] or count rate (the file's unit), as the line's `measure` says */
    value: Type.Number({ minimum: 0, maximum: 1e9 }),
  },
  { additionalProperties: false },
);

export const calibrationSchema = Type.Object(
  {
    /** count rate through the vapour space only (no liquid on the chord) */
    vapourCountRate: Type.Number({ exclusiveMinimum: 0, maximum: 1e9 }),
    /** count rate through the column full of clear liquid */
    liquidCountRate: Type.Number({ exclusiveMinimum: 0, maximum: 1e9 }),
    /** the file's count-rate unit as written (e.g. counts/s); informative only */
    unit: text(40),
  },
  { additionalProperties: false },
);

export const scanLineSchema = Type.Object(
  {
    label: text(80, 1),
    /** where the beam crosses the column, e.g. "0°–180° through the active area of pass 1" */
    chord: text(200),
    /** orientation of the source on the shell [degrees from the column's 0° mark], when recorded */
    orientation_deg: nullable(Type.Number({ minimum: 0, maximum: 360 })),
    /** pass scanned on a multipass tray (1-based), when the chord is per pass */
    pass: nullable(Type.Integer({ minimum: 1, maximum: 8 })),
    takenOn: date,
    operatingCase: text(200),
    measure: literals(SCAN_MEASURES),
    /** required for a count-rate line */
    calibration: nullable(calibrationSchema),
    points: Type.Array(scanPointSchema, { minItems: 2, maxItems: 5000 }),
  },
  { additionalProperties: false },
);

export const gammaScanDataSchema = Type.Object(
  {
    datum: datumSchema,
    /** clear-liquid and vapour densities on the scanned trays [kg/m³], for reading a density scan */
    liquidDensity_kg_m3: nullable(Type.Number({ exclusiveMinimum: 0, maximum: 3000 })),
    vapourDensity_kg_m3: nullable(Type.Number({ minimum: 0, maximum: 1000 })),
    lines: Type.Array(scanLineSchema, { minItems: 1, maxItems: 12 }),
  },
  { additionalProperties: false },
);

/** One measured ΔP: between two tappings (elevations) or over a named tray section of the column. */
export const dpReadingSchema = Type.Object(
  {
    label: text(80, 1),
    /** upper and lower tapping elevations on the datum's scale [m]; null when `section` is given */
    upperElevation_m: nullable(elevation),
    lowerElevation_m: nullable(elevation),
    /** a tray section's name, for a ΔP measured over that section */
    section: nullable(text(80, 1)),
    /** measured ΔP between the two tappings [Pa] */
    measured_Pa: Type.Number({ minimum: 0, maximum: 1e6 }),
  },
  { additionalProperties: false },
);

export const dpSurveyDataSchema = Type.Object(
  {
    datum: datumSchema,
    /** instrument and method, e.g. "one digital gauge moved between nozzles, lines purged" */
    gauge: text(300),
    /** true when the readings already exclude the static head of vapour between the tappings (else it is subtracted) */
    vapourHeadCorrected: Type.Boolean(),
    readings: Type.Array(dpReadingSchema, { minItems: 1, maxItems: 100 }),
  },
  { additionalProperties: false },
);

export const temperatureReadingSchema = Type.Object(
  { tray: Type.Integer({ minimum: 1, maximum: 500 }), temperature_C: Type.Number({ minimum: -273.15, maximum: 1000 }) },
  { additionalProperties: false },
);

export const temperatureSurveyDataSchema = Type.Object(
  {
    /** instrument, e.g. "contact thermometer on the shell" or "installed thermocouples" */
    instrument: text(300),
    readings: Type.Array(temperatureReadingSchema, { minItems: 1, maxItems: 500 }),
  },
  { additionalProperties: false },
);

const headerFields = {
  title: text(200, 1),
  takenOn: date,
  operatingCase: text(200),
  runId: Type.Optional(nullable(uuid)),
  inspectionId: Type.Optional(nullable(uuid)),
  /** taken before or after that inspection's turnaround */
  inspectionTiming: Type.Optional(nullable(literals(INSPECTION_TIMINGS))),
  notes: Type.Optional(lines(4000)),
};

/** The data of each kind of evidence. */
export const EVIDENCE_DATA_SCHEMAS = {
  'gamma-scan': gammaScanDataSchema,
  'dp-survey': dpSurveyDataSchema,
  'temperature-survey': temperatureSurveyDataSchema,
} as const;

/**
 * A new record: the header, its kind, and the data of that kind. The route checks the header and the kind; the
 * service then checks `data` against EVIDENCE_DATA_SCHEMAS[kind], so an error names the field under `data`
 * rather than listing the faults of every kind it is not.
 */
export const createEvidenceBody = Type.Object(
  {
    ...headerFields,
    kind: literals(EVIDENCE_KINDS),
    data: Type.Union([gammaScanDataSchema, dpSurveyDataSchema, temperatureSurveyDataSchema]),
  },
  { additionalProperties: false },
);
/** What the route validates (data checked per kind by the service). */
export const createEvidenceEnvelope = Type.Object(
  { ...headerFields, kind: literals(EVIDENCE_KINDS), data: Type.Object({}) },
  { additionalProperties: false },
);

export const updateEvidenceBody = Type.Object(
  {
    version: Type.Integer({ minimum: 1 }),
    title: Type.Optional(text(200, 1)),
    takenOn: Type.Optional(date),
    operatingCase: Type.Optional(text(200)),
    runId: Type.Optional(nullable(uuid)),
    inspectionId: Type.Optional(nullable(uuid)),
    inspectionTiming: Type.Optional(nullable(literals(INSPECTION_TIMINGS))),
    notes: Type.Optional(lines(4000)),
    /** the datum's adjustment [m] (gamma scans and ΔP surveys) */
    nudge_m: Type.Optional(Type.Number({ minimum: -5, maximum: 5 })),
  },
  { additionalProperties: false },
);

export const evidenceListQuery = Type.Object({ kind: Type.Optional(literals(EVIDENCE_KINDS)) }, { additionalProperties: false });

export const evidenceReadingQuery = Type.Object({ runId: Type.Optional(uuid) }, { additionalProperties: false });

export const deleteEvidenceQuery = Type.Object({ version: Type.Integer({ minimum: 1 }) }, { additionalProperties: false });

/** Scan import: the fields of a file column, its units, and the header of the gamma scan to store. */
export const scanImportMapping = Type.Object(
  {
    elevation: Type.Integer({ minimum: 0, maximum: 199 }),
    density: Type.Optional(Type.Integer({ minimum: 0, maximum: 199 })),
    countRate: Type.Optional(Type.Integer({ minimum: 0, maximum: 199 })),
    line: Type.Optional(Type.Integer({ minimum: 0, maximum: 199 })),
  },
  { additionalProperties: false },
);
export const scanImportUnits = Type.Object(
  { elevation: literals(['m', 'ft', 'mm', 'in'] as const), density: Type.Optional(literals(['kg/m3', 'lb/ft3'] as const)) },
  { additionalProperties: false },
);

export const scanImportCommitBody = Type.Object(
  {
    token: uuid,
    mapping: scanImportMapping,
    units: scanImportUnits,
    title: text(200, 1),
    takenOn: date,
    operatingCase: text(200),
    chord: text(200),
    orientation_deg: nullable(Type.Number({ minimum: 0, maximum: 360 })),
    pass: nullable(Type.Integer({ minimum: 1, maximum: 8 })),
    datum: datumSchema,
    calibration: nullable(calibrationSchema),
    liquidDensity_kg_m3: nullable(Type.Number({ exclusiveMinimum: 0, maximum: 3000 })),
    vapourDensity_kg_m3: nullable(Type.Number({ minimum: 0, maximum: 1000 })),
    runId: Type.Optional(nullable(uuid)),
    inspectionId: Type.Optional(nullable(uuid)),
    inspectionTiming: Type.Optional(nullable(literals(INSPECTION_TIMINGS))),
    notes: Type.Optional(lines(4000)),
  },
  { additionalProperties: false },
);

export const scanImportPreviewQuery = Type.Object({ sheet: Type.Optional(text(100)) }, { additionalProperties: false });
