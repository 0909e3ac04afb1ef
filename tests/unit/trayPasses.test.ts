import { describe, expect, it } from 'vitest';
import { passFault, passNumbers, trayPassCount } from '../../shared/passes.js';

/** The pass numbers a tray has come from the tray section that holds it (invented column: 1–8 one pass, 9–20 two, 21–30 four). */
const sections = [
  { firstTray: 1, lastTray: 8, passes: 1 },
  { firstTray: 20, lastTray: 9, passes: 2 }, // numbered the other way round: still trays 9–20
  { firstTray: 21, lastTray: 30, passes: 4 },
];

describe('passes of a tray', () => {
  it('are those of its section; a tray outside every section has one', () => {
    expect([5, 9, 15, 20, 21, 30, 31].map((t) => trayPassCount(sections, t))).toEqual([1, 2, 2, 2, 4, 4, 1]);
    expect(passNumbers(trayPassCount(sections, 12))).toEqual([1, 2]);
    expect(passNumbers(4)).toEqual([1, 2, 3, 4]);
  });

  it('a pass the tray does not have is a fault naming the tray and its passes', () => {
    expect(passFault(sections, 12, 2)).toBeUndefined();
    expect(passFault(sections, 12, 3)).toBe('tray 12 has 2 passes: give a pass from 1 to 2');
    expect(passFault(sections, 4, 2)).toBe('tray 4 has one pass: the pass is 1');
    expect(passFault(sections, 25, 4)).toBeUndefined();
    expect(passFault(sections, 25, 0)).toMatch(/from 1 to 4/);
  });

  it('without a tray, any pass some tray has is allowed', () => {
    expect(passFault(sections, null, 4)).toBeUndefined();
    expect(passFault(sections.slice(0, 2), null, 4)).toBe(
      'no tray of this column has more than 2 passes: give a pass from 1 to 2',
    );
    expect(passFault([], null, 1)).toBeUndefined();
  });
});
