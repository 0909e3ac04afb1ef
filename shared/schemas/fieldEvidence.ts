/**
 * Field evidence against the rating (issue 16): gamma-scan reading, pressure-drop and temperature
 * surveys. TypeBox schemas; the TypeScript types derive from them (shared/types/fieldEvidence.ts), so the
 * engine, the CLI, the API and the client share one definition. SI units; the unit is in each field name.
 * Section geometry, tray loads and method options are the rating request's own sub-schemas.
 */
import { Type } from '@sinclair/typebox';
import { FromJson } from '../contract/schema.js';
import { methodOptionsSchema, trayLoadSchema } from './ratingRequest.js';
import { studySectionSchema } from './pumpAroundStudy.js';

const trayNumber = Type.Integer({ minimum: 1, maximum: 1000 });
const elevation = Type.Number({ minimum: -1000, maximum: 1000 });
const density = (maximum: number) => Type.Number({ exclusiveMinimum: 0, maximum });

export const SCAN_FINDINGS = ['normal', 'flooded', 'missing-tray', 'low-liquid', 'high-froth'] as const;

export const scanFindingSchema = Type.Union(SCAN_FINDINGS.map((f) => Type.Literal(f)));
export const trayNumberingSchema = Type.Union([Type.Literal('top-down'), Type.Literal('bottom-up')]);
export const elevationSectionSchema = FromJson(studySectionSchema);
export const trayLoadTSchema = FromJson(trayLoadSchema);
export const methodOptionsTSchema = FromJson(methodOptionsSchema);

/** The datum: the elevation of one tray's deck (m, on the scan's elevation scale), nudged by offset_m. */
export const scanDatumSchema = Type.Object(
  { tray: trayNumber, elevation_m: elevation, offset_m: Type.Optional(Type.Number({ minimum: -100, maximum: 100 })) },
  { additionalProperties: false },
);

/** One scan reading: a density or a count rate (one of the two, the same kind on every point). */
export const scanPointSchema = Type.Object(
  {
    elevation_m: elevation,
    density_kg_m3: Type.Optional(Type.Number({ minimum: -500, maximum: 3000 })),
    countRate: Type.Optional(Type.Number({ exclusiveMinimum: 0, maximum: 1e12 })),
  },
  { additionalProperties: false },
);

/**
 * The two calibration count rates of a count-rate scan, on the same chord: through vapour only (a clear
 * vapour space, or the column above its top tray) and through liquid-full column (below the bottom
 * liquid level). Counts per second or any unit, the same for both and for the scan.
 */
export const scanCalibrationSchema = Type.Object(
  {
    vapourCountRate: Type.Number({ exclusiveMinimum: 0, maximum: 1e12 }),
    liquidCountRate: Type.Number({ exclusiveMinimum: 0, maximum: 1e12 }),
  },
  { additionalProperties: false },
);

/** Input of the gamma-scan reading (the `gamma-scan` batch command and the API). */
export const gammaScanInputSchema = Type.Object(
  {
    sections: Type.Array(elevationSectionSchema, { minItems: 1, maxItems: 20 }),
    numbering: Type.Optional(trayNumberingSchema),
    datum: scanDatumSchema,
    trays: Type.Optional(Type.Array(trayLoadTSchema, { minItems: 1, maxItems: 300 })),
    methods: Type.Optional(methodOptionsTSchema),
    liquidDensity_kg_m3: density(3000),
    vapourDensity_kg_m3: density(500),
    scan: Type.Array(scanPointSchema, { minItems: 5, maxItems: 20000 }),
    calibration: Type.Optional(scanCalibrationSchema),
  },
  { additionalProperties: false },
);

/** A scan reduced to a density (the reader's input). */
export const densityPointSchema = Type.Object({ elevation_m: Type.Number(), density_kg_m3: Type.Number() });

/** A tray deck on the scan's elevation scale. */
export const trayElevationSchema = Type.Object({
  tray: Type.Integer(),
  /** deck elevation [m] */
  deckElevation_m: Type.Number(),
  /** space from this deck to the deck above (the section's tray spacing) [mm] */
  traySpacing_mm: Type.Number(),
  section: Type.String(),
});

/** How the scan was read: the threshold and why (stated on pages and reports). */
export const scanThresholdSchema = Type.Object({
  /** fraction of the way from the vapour baseline to the froth reference density */
  fraction: Type.Number(),
  density_kg_m3: Type.Number(),
  vapourBaseline_kg_m3: Type.Number(),
  frothReference_kg_m3: Type.Number(),
  /** vertical resolution of the scan: its median point spacing [mm] */
  resolution_mm: Type.Number(),
  basis: Type.String(),
});

export const scanTrayReadingSchema = Type.Object({
  tray: Type.Integer(),
  deckElevation_m: Type.Number(),
  traySpacing_mm: Type.Number(),
  /** froth height read from the scan [mm] */
  frothHeight_mm: Type.Number(),
  /** tray spacing minus froth height [mm] */
  clearVapourSpace_mm: Type.Number(),
  /** highest (smoothed) density in the lower half of the tray space [kg/m³] */
  peakDensity_kg_m3: Type.Number(),
  /** median (smoothed) density in the upper half of the clear vapour space; null when flooded [kg/m³] */
  vapourSpaceDensity_kg_m3: Type.Union([Type.Number(), Type.Null()]),
  predictedFrothHeight_mm: Type.Optional(Type.Number()),
  predictedDowncomerBackup_mm: Type.Optional(Type.Number()),
  finding: scanFindingSchema,
  reason: Type.String(),
});

export const floodedRegionSchema = Type.Object({
  /** top and bottom tray of the region, in the input's numbering */
  topTray: Type.Integer(),
  bottomTray: Type.Integer(),
  /** bottom deck and the deck (or space top) above the top tray [m] */
  fromElevation_m: Type.Number(),
  toElevation_m: Type.Number(),
});

export const gammaScanResultSchema = Type.Object({
  threshold: scanThresholdSchema,
  /** one per tray in the scanned span, top of the column first */
  trays: Type.Array(scanTrayReadingSchema),
  floodedRegions: Type.Array(floodedRegionSchema),
  /** the scan as densities (converted from count rates where given), sorted by elevation */
  profile: Type.Array(densityPointSchema),
  notes: Type.Array(Type.String()),
});

/** Prediction of one tray from the rating (same load case). */
export const trayFrothPredictionSchema = Type.Object({
  tray: Type.Integer(),
  clearLiquidHeight_mm: Type.Number(),
  relativeFrothDensity: Type.Number(),
  frothHeight_mm: Type.Number(),
  downcomerAeratedBackup_mm: Type.Number(),
  totalPressureDrop_Pa: Type.Number(),
  percentFlood: Type.Number(),
});

/** One measured pressure drop: between two elevations (taps) or over a named section. */
export const pressureDropMeasurementSchema = Type.Object(
  {
    label: Type.Optional(Type.String({ minLength: 1, maxLength: 80 })),
    /** lower and upper tap elevations [m], on the datum's scale; or give `section` instead */
    lowerElevation_m: Type.Optional(elevation),
    upperElevation_m: Type.Optional(elevation),
    section: Type.Optional(Type.String({ minLength: 1, maxLength: 80 })),
    /** measured ΔP [Pa] */
    measured_Pa: Type.Number({ minimum: -1e6, maximum: 1e7 }),
    /**
     * true when the reading already excludes the static head of the vapour between the taps (e.g. a
     * transmitter zeroed for it); false (default): the engine subtracts ρV·g·Δz
     */
    vapourHeadCorrected: Type.Optional(Type.Boolean()),
  },
  { additionalProperties: false },
);

export const pressureDropSurveyInputSchema = Type.Object(
  {
    sections: Type.Array(elevationSectionSchema, { minItems: 1, maxItems: 20 }),
    numbering: Type.Optional(trayNumberingSchema),
    datum: scanDatumSchema,
    trays: Type.Array(trayLoadTSchema, { minItems: 1, maxItems: 300 }),
    methods: Type.Optional(methodOptionsTSchema),
    measurements: Type.Array(pressureDropMeasurementSchema, { minItems: 1, maxItems: 200 }),
  },
  { additionalProperties: false },
);

export const PRESSURE_DROP_FLAGS = ['low', 'as-predicted', 'high', 'flooding'] as const;

export const pressureDropSurveyRowSchema = Type.Object({
  label: Type.String(),
  /** trays whose decks lie between the taps (or in the section), top first */
  trays: Type.Array(Type.Integer()),
  measured_Pa: Type.Number(),
  vapourStaticHead_Pa: Type.Number(),
  /** measured minus the vapour static head (unless already corrected) [Pa] */
  corrected_Pa: Type.Number(),
  predicted_Pa: Type.Number(),
  /** corrected over predicted */
  ratio: Type.Number(),
  measuredPerTray_Pa: Type.Number(),
  predictedPerTray_Pa: Type.Number(),
  /** ΔP per tray a flooded (froth-filled) section would show [Pa] */
  floodingPerTray_Pa: Type.Number(),
  flag: Type.Union(PRESSURE_DROP_FLAGS.map((f) => Type.Literal(f))),
  reason: Type.String(),
});

export const pressureDropSurveyResultSchema = Type.Object({
  rows: Type.Array(pressureDropSurveyRowSchema),
  notes: Type.Array(Type.String()),
});

export const temperatureSurveyInputSchema = Type.Object(
  {
    /** the load case: its trays carry the predicted temperature_C */
    trays: Type.Array(trayLoadTSchema, { minItems: 1, maxItems: 300 }),
    measurements: Type.Array(
      Type.Object(
        { tray: trayNumber, temperature_C: Type.Number({ minimum: -273.15, maximum: 2000 }) },
        { additionalProperties: false },
      ),
      { minItems: 1, maxItems: 300 },
    ),
    /** deviation counted as agreement [K] (default 5, common practice) */
    tolerance_K: Type.Optional(Type.Number({ exclusiveMinimum: 0, maximum: 200 })),
  },
  { additionalProperties: false },
);

export const TEMPERATURE_FLAGS = ['as-predicted', 'hotter', 'colder', 'no-prediction'] as const;

export const temperatureSurveyResultSchema = Type.Object({
  tolerance_K: Type.Number(),
  rows: Type.Array(
    Type.Object({
      tray: Type.Integer(),
      measured_C: Type.Number(),
      predicted_C: Type.Union([Type.Number(), Type.Null()]),
      deviation_K: Type.Union([Type.Number(), Type.Null()]),
      flag: Type.Union(TEMPERATURE_FLAGS.map((f) => Type.Literal(f))),
      reason: Type.String(),
    }),
  ),
  notes: Type.Array(Type.String()),
});
