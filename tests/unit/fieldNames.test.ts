import { describe, expect, it } from 'vitest';
import { fieldWords, pathWords } from '../../src/utils/fieldNames.js';

describe('API error field paths in words', () => {
  it('splits camelCase and names the unit suffix', () => {
    expect(fieldWords('condenserDuty_kW')).toBe('condenser duty (kW)');
    expect(fieldWords('downcomerTopArea_m2')).toBe('downcomer top area (m²)');
    expect(fieldWords('vapourDensity_kg_m3')).toBe('vapour density (kg/m³)');
    expect(fieldWords('latentHeat_kJ_kg')).toBe('latent heat (kJ/kg)');
    expect(fieldWords('endDate')).toBe('end date');
  });

  it('turns list indices into 1-based rows and drops container names', () => {
    expect(pathWords('trays.3.vapourMassFlow_kg_h')).toBe('trays, row 4, vapour mass flow (kg/h)');
    expect(pathWords('geometry.traySpacing_mm')).toBe('tray spacing (mm)');
    expect(pathWords('body')).toBe('body');
  });
});
