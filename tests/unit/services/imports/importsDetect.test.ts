import { describe, expect, it } from 'vitest';
import {
  detectHeader,
  detectNumbering,
  fieldOfHeader,
  splitHeader,
  unitOf,
} from '../../../../server/services/imports/importsDetect.js';
import { convertRows } from '../../../../server/services/imports/importsRows.js';
import { parseLoadNumber as parseNumber } from '../../../../shared/trayLoadRules.js';
import { toSI } from '../../../../shared/units.js';

describe('import header and unit detection', () => {
  it('splits a header into name and unit in the usual spellings', () => {
    expect(splitHeader('Vapour flow (lb/h)')).toEqual({ name: 'Vapour flow', unit: 'lb/h' });
    expect(splitHeader('Liquid density [kg/m3]')).toEqual({ name: 'Liquid density', unit: 'kg/m3' });
    expect(splitHeader('Pressure, bar')).toEqual({ name: 'Pressure', unit: 'bar' });
    expect(splitHeader('Tray')).toEqual({ name: 'Tray', unit: null });
  });

  it('maps header names to fields, properties before flows', () => {
    const cases: [string, string | null][] = [
      ['Tray', 'tray'],
      ['Stage no.', 'stage'],
      ['Vapour density (lb/ft3)', 'vapourDensity'],
      ['Vapor mass flow', 'vapourMassFlow'],
      ['Vapour to tray (kg/h)', 'vapourMassFlow'],
      ['Liquid from tray (kg/h)', 'liquidMassFlow'],
      ['Liq density', 'liquidDensity'],
      ['Surface tension', 'surfaceTension'],
      ['Liquid viscosity (cP)', 'liquidViscosity'],
      ['Vapour viscosity (cP)', null],
      ['Temperature (F)', 'temperature'],
      ['Pressure (psia)', 'pressure'],
      ['Remarks', null],
    ];
    for (const [h, f] of cases) expect(fieldOfHeader(h), h).toBe(f);
  });

  it('recognises every unit the import accepts', () => {
    const cases: [Parameters<typeof unitOf>[0], string, string][] = [
      ['vapourMassFlow', 'kg/h', 'kg/h'],
      ['vapourMassFlow', 'lb/hr', 'lb/h'],
      ['liquidMassFlow', 't/h', 't/h'],
      ['liquidDensity', 'kg/m³', 'kg/m3'],
      ['liquidDensity', 'lb/ft3', 'lb/ft3'],
      ['surfaceTension', 'mN/m', 'mN/m'],
      ['surfaceTension', 'dyne/cm', 'dyn/cm'],
      ['liquidViscosity', 'cP', 'cP'],
      ['liquidViscosity', 'mPa·s', 'mPa.s'],
      ['temperature', '°C', 'C'],
      ['temperature', 'degF', 'F'],
      ['pressure', 'kPa', 'kPa'],
      ['pressure', 'bara', 'bar'],
      ['pressure', 'psia', 'psia'],
    ];
    for (const [f, text, id] of cases) expect(unitOf(f, text), `${f} ${text}`).toBe(id);
    expect(unitOf('pressure', 'furlongs')).toBeNull();
  });

  it('finds the header below title rows and reads a unit row under it', () => {
    const cells = [
      ['Invented profile export'],
      [],
      ['Stage', 'Vapour flow', 'Liquid flow', 'Vapour density', 'Liquid density', 'Surface tension', 'Note'],
      ['', 'lb/h', 'lb/h', 'lb/ft3', 'lb/ft3', 'dyn/cm', ''],
      ['2', '1', '2', '0.2', '45', '18', ''],
    ];
    const d = detectHeader(cells)!;
    expect(d.headerIndex).toBe(2);
    expect(d.unitRowIndex).toBe(3);
    expect(d.mapping).toEqual({
      stage: 0,
      vapourMassFlow: 1,
      liquidMassFlow: 2,
      vapourDensity: 3,
      liquidDensity: 4,
      surfaceTension: 5,
    });
    expect(d.units).toEqual({
      vapourMassFlow: 'lb/h',
      liquidMassFlow: 'lb/h',
      vapourDensity: 'lb/ft3',
      liquidDensity: 'lb/ft3',
      surfaceTension: 'dyn/cm',
    });
    expect(d.notes).toEqual(['Column "Note" is not used']);
    expect(
      detectHeader([
        ['a', 'b'],
        ['1', '2'],
      ]),
    ).toBeNull();
  });

  it('notes an assumed unit when the header has none', () => {
    const d = detectHeader([['Tray', 'Vapour flow', 'Liquid flow (kg/h)', 'Liquid density (kg/m3)']])!;
    expect(d.units.vapourMassFlow).toBeUndefined();
    expect(d.notes[0]).toBe('No unit recognised for "Vapour flow"; assumed kg/h — confirm or change it');
  });

  it('guesses the numbering direction from the pressure profile', () => {
    const mapping = { tray: 0, pressure: 1 };
    const down = detectNumbering(
      [
        ['1', '150'],
        ['2', '151'],
        ['3', '152'],
      ],
      mapping,
      'bottom-up',
      [],
    );
    expect(down.direction).toBe('top-down');
    const up = detectNumbering(
      [
        ['1', '152'],
        ['2', '151'],
        ['3', '150'],
      ],
      mapping,
      'top-down',
      [],
    );
    expect(up.direction).toBe('bottom-up');
    expect(detectNumbering([['1', '150']], { tray: 0 }, 'top-down', []).direction).toBe('top-down');
  });

  it('parses plain numbers only', () => {
    expect(parseNumber('1,234.5')).toBe(1234.5);
    expect(parseNumber(' 12 ')).toBe(12);
    expect(parseNumber('1.5e3')).toBe(1500);
    expect(parseNumber('1,5')).toBeNull();
    expect(parseNumber('abc')).toBeNull();
    expect(parseNumber('')).toBeNull();
  });

  it('converts rows and reports a missing required mapping once', () => {
    const r = convertRows({
      headers: ['Tray', 'V'],
      rows: [['1', '5']],
      firstDataRow: 2,
      mapping: { tray: 0, vapourMassFlow: 1 },
      units: {},
      numbering: { key: 'tray', direction: 'top-down' },
      trayCount: 10,
      columnDirection: 'top-down',
    });
    expect(r.loads).toEqual([]);
    expect(r.errors.map((e) => e.column)).toEqual(['liquidMassFlow', 'vapourDensity', 'liquidDensity', 'surfaceTension']);
  });

  it('reads gauge pressure units, makes them absolute with the standard atmosphere, and asks when a unit says neither', () => {
    const head = (unit: string) => ['Tray', 'Vapour flow (kg/h)', 'Liquid flow (kg/h)', `Pressure (${unit})`];
    expect(detectHeader([head('psig')])!.units.pressure).toBe('psig');
    expect(detectHeader([head('barg')])!.units.pressure).toBe('barg');
    expect(detectHeader([head('kPag')])!.units.pressure).toBe('kPag');
    expect(detectHeader([head('bara')])!.notes.join(' ')).not.toMatch(/gauge or absolute/);
    const plain = detectHeader([head('bar')])!;
    expect(plain.units.pressure).toBe('bar');
    expect(plain.notes).toContain(
      '"Pressure (bar)" does not say gauge or absolute; read as absolute (bar) — choose Gauge if it is gauge',
    );
    // 1 psi = 6.894 757 kPa; standard atmosphere 101.325 kPa exactly (NIST SP 811, App. B.9)
    expect(toSI('pressure', 10, 'psig')).toBeCloseTo(10 * 6.894757 + 101.325, 4);
    expect(toSI('pressure', 2, 'barg')).toBeCloseTo(301.325, 9);
    expect(toSI('pressure', 0, 'kPag')).toBeCloseTo(101.325, 9);
  });
});
