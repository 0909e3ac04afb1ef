import { describe, expect, it } from 'vitest';
import { fillStageMap, stageMapErrors, stageMapSummary } from '../../shared/stageMap.js';
import type { StageMapEntry } from '../../shared/types/loads.js';

/** Stage maps below are invented (a 20-tray column); the checks are the rules the server applies on save. */
const e = (stage: number, firstTray: number, lastTray: number): StageMapEntry => ({ stage, firstTray, lastTray });

describe('stageMapErrors', () => {
  it('accepts a map with lumped stages and gaps, an empty map and no map', () => {
    expect(stageMapErrors([e(1, 1, 1), e(2, 2, 4), e(3, 7, 8)], 20)).toEqual([]);
    expect(stageMapErrors([], 20)).toEqual([]);
    expect(stageMapErrors(null, 20)).toEqual([]);
    expect(stageMapErrors(undefined, 20)).toEqual([]);
  });

  it('names an overlap by row and field, whatever the row order', () => {
    expect(stageMapErrors([e(3, 6, 8), e(2, 3, 6)], 20)).toEqual([
      { path: 'stageMap.0.firstTray', message: 'stage 3 (trays 6–8) overlaps stage 2 (trays 3–6)' },
    ]);
  });

  it('finds an overlap with a long range that is not the neighbour in tray order', () => {
    const errors = stageMapErrors([e(1, 1, 10), e(2, 2, 3), e(3, 5, 6)], 20);
    expect(errors.map((x) => x.path)).toEqual(['stageMap.1.firstTray', 'stageMap.2.firstTray']);
    expect(errors[1]!.message).toBe('stage 3 (trays 5–6) overlaps stage 1 (trays 1–10)');
  });

  it('refuses lastTray below firstTray without also calling it an overlap', () => {
    expect(stageMapErrors([e(1, 1, 2), e(2, 5, 3)], 20)).toEqual([
      { path: 'stageMap.1.lastTray', message: 'stage 2: lastTray (3) must not be below firstTray (5)' },
    ]);
  });

  it('refuses trays outside 1..trayCount', () => {
    expect(stageMapErrors([e(1, 19, 21)], 20)).toEqual([
      { path: 'stageMap.0.lastTray', message: 'stage 1: tray 21 is outside the column (trays 1–20)' },
    ]);
    expect(stageMapErrors([e(1, 0, 2)], 20)).toEqual([
      { path: 'stageMap.0.firstTray', message: 'row 1: firstTray must be a whole number of at least 1' },
    ]);
  });

  it('refuses a stage listed twice', () => {
    expect(stageMapErrors([e(4, 1, 1), e(5, 2, 2), e(4, 3, 3)], 20, 'numbering.stageMap')).toEqual([
      { path: 'numbering.stageMap.2.stage', message: 'stage 4 appears twice (also in row 1)' },
    ]);
  });

  it('refuses empty or fractional cells as the client holds them while the user types', () => {
    const errors = stageMapErrors([{ stage: Number.NaN, firstTray: 2.5, lastTray: 3 }], 20);
    expect(errors.map((x) => x.path)).toEqual(['stageMap.0.stage', 'stageMap.0.firstTray']);
    expect(errors[0]!.message).toBe('row 1: stage must be a whole number of at least 0');
  });

  it('accepts stage 0 (a condenser counted as stage 0) but not a negative stage', () => {
    expect(stageMapErrors([e(0, 1, 1)], 20)).toEqual([]);
    expect(stageMapErrors([e(-1, 1, 1)], 20).map((x) => x.path)).toEqual(['stageMap.0.stage']);
  });
});

describe('fillStageMap', () => {
  it('maps one stage per tray with the offset when stages run the way the column is numbered', () => {
    expect(fillStageMap(4, 1, 'top-down', 'top-down')).toEqual([e(2, 1, 1), e(3, 2, 2), e(4, 3, 3), e(5, 4, 4)]);
  });

  it('reverses when stages run the other way (the same trays as the import offset with a flipped file)', () => {
    expect(fillStageMap(3, 0, 'top-down', 'bottom-up')).toEqual([e(1, 3, 3), e(2, 2, 2), e(3, 1, 1)]);
    expect(stageMapErrors(fillStageMap(46, 1, 'bottom-up', 'top-down'), 46)).toEqual([]);
  });
});

describe('stageMapSummary', () => {
  it('counts stages, gives the tray span and names lumped stages and gaps', () => {
    const map = [e(1, 1, 1), e(2, 2, 2), e(3, 3, 3), e(4, 4, 4), e(5, 5, 6), e(6, 7, 8), e(7, 10, 10)];
    expect(stageMapSummary(map)).toBe(
      '7 stages → trays 1–10; trays 5–6 share stage 5; trays 7–8 share stage 6; no stage for tray 9',
    );
  });

  it('lists at most three lumped stages and leaves incomplete rows out', () => {
    const map = [e(1, 1, 2), e(2, 3, 4), e(3, 5, 6), e(4, 7, 8), e(5, 9, 10), { stage: 6, firstTray: Number.NaN, lastTray: 11 }];
    expect(stageMapSummary(map)).toBe(
      '5 stages → trays 1–10; trays 1–2 share stage 1; trays 3–4 share stage 2; trays 5–6 share stage 3; 2 more stages cover several trays',
    );
  });

  it('says when there is no map', () => {
    expect(stageMapSummary(null)).toBe('No stage-to-tray map');
    expect(stageMapSummary([e(1, 1, 1)])).toBe('1 stage → tray 1');
  });
});
