import { describe, expect, it } from 'vitest';
import { sectionBoundaries } from '../../../../server/services/reports/studyReportFiles.js';

/** The study report's traffic chart marks where each tray section ends (invented sections). */
describe('study report section boundaries', () => {
  it('a line half a tray past each section but the last, named after the section that follows', () => {
    const sections = [
      { name: 'Wash', fromTray: 31, toTray: 40 },
      { name: 'Top', fromTray: 1, toTray: 8 },
      { name: 'Middle', fromTray: 30, toTray: 9 }, // entered the other way round
    ];
    expect(sectionBoundaries(sections)).toEqual([
      { x: 8.5, label: 'Middle' },
      { x: 30.5, label: 'Wash' },
    ]);
    expect(sectionBoundaries([{ name: 'Only', fromTray: 1, toTray: 20 }])).toEqual([]);
  });
});
