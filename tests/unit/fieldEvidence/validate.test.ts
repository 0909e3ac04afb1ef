import { describe, expect, it } from 'vitest';
import { validateGammaScanInput } from '../../../server/engine/fieldEvidence/index.js';
import { gammaInput, scanSpec } from './fixtures.js';

const paths = (json: unknown): string[] => {
  const v = validateGammaScanInput(json);
  return v.ok ? [] : v.errors.map((e) => e.path);
};

describe('gamma-scan input validation', () => {
  it('a valid input passes and is not mutated', () => {
    const input = gammaInput(scanSpec([]), true);
    const copy = structuredClone(input);
    expect(validateGammaScanInput(input).ok).toBe(true);
    expect(input).toEqual(copy);
  });

  it('names the field: unknown fields, missing datum, bad density order', () => {
    const input = { ...gammaInput(scanSpec([])), colour: 'red' } as Record<string, unknown>;
    expect(paths(input)).toContain('/colour');
    const { datum: _d, ...noDatum } = gammaInput(scanSpec([]));
    expect(paths(noDatum)).toContain('/datum');
    const swapped = { ...gammaInput(scanSpec([])), vapourDensity_kg_m3: 400, liquidDensity_kg_m3: 300 };
    const v = validateGammaScanInput(swapped);
    expect(v.ok).toBe(false);
    if (!v.ok)
      expect(v.errors[0]).toEqual({
        path: '/vapourDensity_kg_m3',
        message: expect.stringMatching(/^vapourDensity_kg_m3: must be below/),
      });
  });

  it('scan points: exactly one of density or count rate; count rates need the calibration', () => {
    const input = gammaInput(scanSpec([]));
    input.scan[3] = { elevation_m: input.scan[3]!.elevation_m };
    expect(paths(input)).toContain('/scan/3');
    const counts = gammaInput(scanSpec([], { countRates: { vapourCountRate: 1000, liquidCountRate: 100 } }));
    delete counts.calibration;
    expect(paths(counts)).toContain('/calibration');
    counts.calibration = { vapourCountRate: 100, liquidCountRate: 1000 };
    expect(paths(counts)).toContain('/calibration/liquidCountRate');
  });

  it('datum outside the sections, a gap between sections, loads outside the sections', () => {
    const input = gammaInput(scanSpec([]), true);
    input.datum = { tray: 40, elevation_m: 5 };
    expect(paths(input)).toContain('/datum/tray');
    const gap = gammaInput(scanSpec([]));
    gap.sections[1]!.toTray = 8;
    expect(paths(gap)).toContain('/sections');
    const loads = gammaInput(scanSpec([]), true);
    loads.trays![0]!.tray = 99;
    expect(paths(loads)).toContain('/trays/0/tray');
  });

  it('a scan that covers no tray space or is too coarse', () => {
    const far = gammaInput(scanSpec([]));
    far.datum = { tray: 16, elevation_m: 60 };
    const v = validateGammaScanInput(far);
    expect(v.ok).toBe(false);
    if (!v.ok) expect(v.errors[0]!.message).toMatch(/^scan: covers no whole tray space.*check the datum/);
    const coarse = gammaInput(scanSpec([], { step_m: 0.2 }));
    expect(paths(coarse)).toContain('/scan');
  });
});
