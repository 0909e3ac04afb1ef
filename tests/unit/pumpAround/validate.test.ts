import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { validateStudyInput } from '../../../server/engine/pumpAround/index.js';

type Json = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any
const raw = (): Json => JSON.parse(readFileSync('examples/pump-around-study.json', 'utf8')) as Json;

function errorsOf(mutate: (j: Json) => void): { path: string; message: string }[] {
  const j = raw();
  mutate(j);
  const v = validateStudyInput(j);
  if (v.ok) throw new Error('expected the input to be rejected');
  return v.errors;
}

describe('validateStudyInput', () => {
  it('accepts the example, fills in defaults and does not mutate its input', () => {
    const j = raw();
    delete j.margin;
    delete j.numbering;
    const before = JSON.stringify(j);
    const v = validateStudyInput(j);
    expect(v.ok).toBe(true);
    if (v.ok) {
      expect(v.value.margin).toBe(0.7);
      expect(v.value.numbering).toBe('top-down');
    }
    expect(JSON.stringify(j)).toBe(before);
  });

  const cases: [string, (j: Json) => void, string, RegExp][] = [
    ['missing latent heat', (j) => delete j.latentHeat_kJ_kg, '/latentHeat_kJ_kg', /is required/],
    ['negative latent heat', (j) => (j.latentHeat_kJ_kg = -5), '/latentHeat_kJ_kg', /latentHeat_kJ_kg: must be > 0/],
    ['unknown field', (j) => (j.pumpAround.colour = 'red'), '/pumpAround/colour', /is not an allowed field/],
    ['margin above 1', (j) => (j.margin = 1.4), '/margin', /margin: must be <= 1/],
    ['bad numbering', (j) => (j.numbering = 'sideways'), '/numbering', /must be one of "top-down", "bottom-up"/],
    [
      'tray load field of a named tray',
      (j) => (j.trays[3].liquidMassFlow_kg_h = -1),
      '/trays/3/liquidMassFlow_kg_h',
      /^tray 4, liquidMassFlow_kg_h: must be >= 0/,
    ],
    [
      'draw tray outside the column',
      (j) => (j.pumpAround.drawTray = 40),
      '/pumpAround/drawTray',
      /drawTray: tray 40 is outside the column's sections \(trays 1–16\)/,
    ],
    [
      'return tray below the draw',
      (j) => (j.pumpAround.returnTray = 12),
      '/pumpAround/returnTray',
      /must be above the draw tray 9 \(a lower number, trays numbered top-down\)/,
    ],
    ['return equal to draw', (j) => (j.pumpAround.returnTray = 9), '/pumpAround/returnTray', /must be above the draw tray/],
    ['tray outside every section', (j) => (j.trays[15].tray = 30), '/trays/15/tray', /tray 30, tray: is not inside any section/],
    ['duplicate tray', (j) => (j.trays[2].tray = 2), '/trays/2/tray', /appears twice/],
    ['overlapping sections', (j) => (j.sections[1].fromTray = 5), '/sections/1/fromTray', /overlap section "Top fractionation"/],
    [
      'both ΔT and circulation',
      (j) => (j.pumpAround.circulation_kg_h = 100000),
      '/pumpAround/circulation_kg_h',
      /either returnTemperatureDrop_K or circulation_kg_h, not both/,
    ],
    [
      'neither ΔT nor circulation',
      (j) => delete j.pumpAround.returnTemperatureDrop_K,
      '/pumpAround/returnTemperatureDrop_K',
      /required unless circulation_kg_h/,
    ],
    ['sweep reversed', (j) => (j.sweep.toDuty_kW = 100), '/sweep/toDuty_kW', /must not be below fromDuty_kW \(3000 kW\)/],
    ['sweep steps not an integer', (j) => (j.sweep.steps = 2.5), '/sweep/steps', /steps: must be integer/],
    [
      'no trays above the zone',
      (j) => (j.trays = j.trays.filter((t: Json) => t.tray >= 7)),
      '/trays',
      /no tray loads above the return tray 7/,
    ],
    [
      'section physics (hole area ≥ active area)',
      (j) => (j.sections[0].holeArea_m2 = 20),
      '/sections/0/holeArea_m2',
      /section "Top fractionation", holeArea_m2: hole area/,
    ],
    [
      'vapour denser than liquid',
      (j) => (j.trays[0].vapourDensity_kg_m3 = 900),
      '/trays/0/vapourDensity_kg_m3',
      /tray 1, vapourDensity_kg_m3/,
    ],
  ];
  for (const [name, mutate, path, message] of cases) {
    it(`rejects ${name}, naming ${path}`, () => {
      const errors = errorsOf(mutate);
      const hit = errors.find((e) => e.path === path);
      expect(hit, JSON.stringify(errors)).toBeDefined();
      expect(hit!.message).toMatch(message);
    });
  }

  it('bottom-up: the return tray must have a higher number than the draw', () => {
    const errors = errorsOf((j) => {
      j.numbering = 'bottom-up';
    });
    expect(errors.find((e) => e.path === '/pumpAround/returnTray')!.message).toMatch(/a higher number, trays numbered bottom-up/);
  });

  it('rejects non-objects', () => {
    for (const x of [null, 42, 'study', []]) expect(validateStudyInput(x).ok).toBe(false);
  });
});
