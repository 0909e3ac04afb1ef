import { describe, expect, it } from 'vitest';
import { trayDeckElevations } from '../../../server/engine/fieldEvidence/index.js';
import { sections } from './fixtures.js';

describe('tray deck elevations', () => {
  it('top-down numbering: tray numbers rise going down, spacing of the lower tray between decks', () => {
    const d = trayDeckElevations(sections('top-down'), 'top-down', { tray: 16, elevation_m: 5 });
    expect(d.map((x) => x.tray)).toEqual(Array.from({ length: 16 }, (_, i) => i + 1));
    const z = new Map(d.map((x) => [x.tray, x.deckElevation_m]));
    expect(z.get(16)).toBe(5);
    expect(z.get(15)).toBeCloseTo(5.61, 9); // 610 mm section
    expect(z.get(10)).toBeCloseTo(5 + 6 * 0.61, 9);
  });

  it('the space between two decks is the lower tray’s section spacing', () => {
    const d = trayDeckElevations(sections('top-down'), 'top-down', { tray: 16, elevation_m: 5 });
    const z = new Map(d.map((x) => [x.tray, x]));
    // tray 10 (610 mm section) lies below tray 9: the distance is tray 10's spacing
    expect(z.get(9)!.deckElevation_m - z.get(10)!.deckElevation_m).toBeCloseTo(0.61, 9);
    expect(z.get(1)!.deckElevation_m - z.get(2)!.deckElevation_m).toBeCloseTo(0.686, 9);
    expect(z.get(1)!.traySpacing_mm).toBe(686);
    expect(z.get(16)!.section).toBe('Lower');
  });

  it('bottom-up numbering gives the same decks for the mirrored tray numbers', () => {
    const td = trayDeckElevations(sections('top-down'), 'top-down', { tray: 16, elevation_m: 5 });
    const bu = trayDeckElevations(sections('bottom-up'), 'bottom-up', { tray: 1, elevation_m: 5 });
    expect(bu.map((x) => x.tray)).toEqual(Array.from({ length: 16 }, (_, i) => 16 - i)); // top first
    bu.forEach((x, i) => expect(x.deckElevation_m).toBeCloseTo(td[i]!.deckElevation_m, 9));
  });

  it('datum on a middle tray and the offset nudge', () => {
    const a = trayDeckElevations(sections(), 'top-down', { tray: 8, elevation_m: 12 });
    const b = trayDeckElevations(sections(), 'top-down', { tray: 8, elevation_m: 12, offset_m: -0.05 });
    expect(a.find((x) => x.tray === 8)!.deckElevation_m).toBe(12);
    expect(a.find((x) => x.tray === 7)!.deckElevation_m).toBeCloseTo(12.686, 9);
    a.forEach((x, i) => expect(b[i]!.deckElevation_m - x.deckElevation_m).toBeCloseTo(-0.05, 9));
  });
});
