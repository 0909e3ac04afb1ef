import { describe, expect, it } from 'vitest';
import { checkMeasurements, levelnessLimit, PUBLISHED_TOLERANCES } from '../../shared/inspectionTolerance.js';
import type { TrayDesign } from '../../shared/types/inspections.js';

const rule = (item: string) => PUBLISHED_TOLERANCES.rules.find((r) => r.item === item)!;
const design: TrayDesign = {
  sectionId: null,
  weirHeight_mm: 50,
  downcomerClearance_mm: 38,
  traySpacing_mm: 610,
  columnDiameter_mm: 2000,
};
const none = { weirHeight_mm: [], downcomerClearance_mm: [], levelness_mm: null, traySpacing_mm: null };

describe('installed-tray tolerances, PIP VEFV1102 / VEFV1102M (as listed in field-practice.md §4.2 [S9])', () => {
  it('holds the published values with their source on every row', () => {
    // PIP VEFV1102: weir height ±1/16 in (±1.6 mm); downcomer clearance ±1/16 in (±1.6 mm); tray spacing ±1/8 in (±3 mm)
    expect(rule('weirHeight').plusMinus_mm).toBe(1.6);
    expect(rule('downcomerClearance').plusMinus_mm).toBe(1.6);
    expect(rule('traySpacing').plusMinus_mm).toBe(3);
    for (const r of PUBLISHED_TOLERANCES.rules) expect(r.source).toMatch(/PIP VEFV1102/);
    // 1/16 in = 1.5875 mm and 1/8 in = 3.175 mm: the SI version rounds to 1.6 and 3 mm
    expect(Math.abs(25.4 / 16 - 1.6)).toBeLessThan(0.02);
  });

  it('levelness high−low by diameter, VEFV1102M: ≤1500 mm A 3/B 5; 1500–3000 A 5/B 6; >3000 A 6/B 10 mm', () => {
    const lv = rule('levelness');
    expect(levelnessLimit(lv, 1200, 'A')).toBe(3);
    expect(levelnessLimit(lv, 1500, 'B')).toBe(5);
    expect(levelnessLimit(lv, 2000, 'A')).toBe(5);
    expect(levelnessLimit(lv, 3000, 'B')).toBe(6);
    expect(levelnessLimit(lv, 4200, 'A')).toBe(6);
    expect(levelnessLimit(lv, 4200, 'B')).toBe(10);
  });

  it('a weir 1.5 mm high passes, 1.7 mm high fails; clearance 2 mm low fails', () => {
    const c = checkMeasurements(
      { ...none, weirHeight_mm: [51.5, 51.7], downcomerClearance_mm: [36] },
      design,
      PUBLISHED_TOLERANCES,
      'A',
    );
    expect(c.map((x) => [x.item, x.point, x.pass])).toEqual([
      ['weirHeight', 0, true],
      ['weirHeight', 1, false],
      ['downcomerClearance', 0, false],
    ]);
    expect(c[1]?.deviation).toBeCloseTo(1.7, 6);
  });

  it('levelness 5 mm on a 2000 mm column passes class A (5 mm) and 5.5 mm fails; tray spacing 613 passes, 614 fails', () => {
    expect(checkMeasurements({ ...none, levelness_mm: 5 }, design, PUBLISHED_TOLERANCES, 'A')[0]?.pass).toBe(true);
    expect(checkMeasurements({ ...none, levelness_mm: 5.5 }, design, PUBLISHED_TOLERANCES, 'A')[0]?.pass).toBe(false);
    expect(checkMeasurements({ ...none, traySpacing_mm: 613 }, design, PUBLISHED_TOLERANCES, 'A')[0]?.pass).toBe(true);
    expect(checkMeasurements({ ...none, traySpacing_mm: 614 }, design, PUBLISHED_TOLERANCES, 'A')[0]?.pass).toBe(false);
  });

  it('without a design value the check is reported as not checked, never as a pass', () => {
    const c = checkMeasurements({ ...none, weirHeight_mm: [50] }, { ...design, weirHeight_mm: null }, PUBLISHED_TOLERANCES, 'A');
    expect(c[0]?.pass).toBeNull();
    expect(c[0]?.message).toMatch(/no design value/);
  });

  it('a project rule set replaces the published one', () => {
    const project = {
      id: 'p',
      name: 'Project sheet',
      source: 'project spec (user entered)',
      rules: [{ item: 'weirHeight' as const, label: 'w', plusMinus_mm: 1, source: 'project' }],
    };
    expect(checkMeasurements({ ...none, weirHeight_mm: [51.5] }, design, project, 'A')[0]?.pass).toBe(false);
  });
});
