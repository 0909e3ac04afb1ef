/** One verdict per tray: dry and flooded trays, flood and entrainment on one basis, seal check applicability. */
import { describe, expect, it } from 'vitest';
import { rateSection, rateTray } from '../../../server/engine/index.js';
import { fairEntrainmentOwnFit } from '../../../server/engine/entrainment.js';
import { DEMO_SECTIONS } from '../../../server/db/seed/demoColumn.js';
import { DEMO_LOAD_CASES } from '../../../server/db/seed/demoLoads.js';
import { rateSnapshot } from '../../../server/services/runs/runs.js';
import { coverageSentence, sectionCoverage, trayRuns, trayState } from '../../../shared/verdict.js';
import type { JetFloodMethod } from '../../../shared/types/rating.js';
import { inventedRequest, seader748Bottom, seaderTray } from './fixtures.js';

/** The invented demo column T-701 rated with one of its load cases (as the demo runs are). */
function demoRun(loadCase: string, jetFlood: JetFloodMethod) {
  const lc = DEMO_LOAD_CASES.find((c) => c.name === loadCase)!;
  const sections = DEMO_SECTIONS.map((s, i) => ({
    ...s,
    sectionId: `s${i}`,
    provenanceDate: s.provenanceDate ?? null,
    overridden: false,
  }));
  return rateSnapshot({
    column: { id: 'c', tag: 'T-701', numbering: 'top-down', trayCount: 46 },
    loadCase: { id: 'l', name: loadCase, basis: lc.basis, version: 1 },
    sections,
    loads: lc.loads,
    methods: { jetFlood },
  }).results;
}

describe('flooded trays', () => {
  it('demo Kister & Haas run, tray 1 (about 131 % of flood): flooded, controlled by jet flood, entrainment not rated', () => {
    const t1 = demoRun('Winter maximum', 'kister-haas').trays[0]!;
    expect(t1.checks.jetFlood!.value).toBeGreaterThan(125);
    expect(t1.checks.jetFlood!.method).toBe('kisterHaasFloodCapacity');
    expect(trayState(t1)).toBe('flooded');
    expect(t1.controllingCheck).toBe('jetFlood');
    expect(t1.checks.entrainment!.status).toBe('na');
    expect(t1.checks.entrainment!.percentOfLimit).toBe(0);
    expect(t1.warnings.find((w) => w.code === 'beyond-flood')?.message).toMatch(/flooded/);
  });

  it('the section margin of a flooded column is set by jet flood, not by entrainment read past flood', () => {
    const r = demoRun('Winter maximum', 'fair');
    const top = r.sections[0]!.summary;
    expect(top.controllingCheck).toBe('jetFlood');
    // before: "615 % entrainment", margin −515 %; now the margin is jet flood's (about 126 % of the 80 % limit)
    expect(top.marginToNearestLimit_percent).toBeGreaterThan(-100);
    expect(r.trays.filter((t) => trayState(t) === 'flooded').map((t) => t.tray)).toContain(1);
  });

  it('the whole column of the demo Kister & Haas run is controlled by jet flood on flooded tray 1, not by entrainment on an unflooded tray', () => {
    const r = demoRun('Winter maximum', 'kister-haas');
    // tray 21 (middle section, about 78 % of flood) has entrainment further past its own limit than tray 1's
    // jet flood; a specialist still names the flooded tray first
    const t21 = r.trays.find((t) => t.tray === 21)!;
    expect(trayState(t21)).not.toBe('flooded');
    expect(t21.checks.entrainment!.percentOfLimit).toBeGreaterThan(r.trays[0]!.checks.jetFlood!.percentOfLimit);
    expect(r.controllingCheck).toBe('jetFlood');
    expect(r.controllingTray).toBe(1);
    expect(r.maxPercentOfLimit).toBeCloseTo(r.trays[0]!.checks.jetFlood!.percentOfLimit, 9);
    // a section without a flooded tray keeps the check furthest past its limit
    const middle = r.sections[1]!.summary;
    expect(middle.controllingCheck).toBe('entrainment');
  });

  it('a tray past flood with a Fair rating is flooded too (100 % of flood is the threshold)', () => {
    const req = inventedRequest();
    const heavy = rateTray(req.section, { ...req.trays[0]!, vapourMassFlow_kg_h: req.trays[0]!.vapourMassFlow_kg_h * 3 });
    expect(heavy.checks.jetFlood.value).toBeGreaterThanOrEqual(100);
    expect(trayState(heavy)).toBe('flooded');
    expect(heavy.controllingCheck).toBe('jetFlood');
    const normal = rateTray(req.section, req.trays[0]!);
    expect(normal.checks.jetFlood.value).toBeLessThan(100);
    expect(trayState(normal)).not.toBe('flooded');
    expect(normal.checks.entrainment.status).not.toBe('na');
  });
});

describe('flood and entrainment on one basis', () => {
  it("with Kister & Haas chosen, entrainment is read from Kister & Haas percent flood (not Fair's)", () => {
    const req = { section: seaderTray, trays: [seader748Bottom] };
    const kh = rateSection({ ...req, methods: { jetFlood: 'kister-haas' } }).trays[0]!;
    const fair = rateSection(req).trays[0]!;
    const flvEnt = Math.min(Math.max(kh.details.flowParameter, 0.01), 0.2);
    expect(kh.details.entrainmentFraction).toBeCloseTo(
      fairEntrainmentOwnFit(flvEnt, kh.details.percentFloodKisterHaas! / 100),
      12,
    );
    expect(fair.details.entrainmentFraction).toBeCloseTo(fairEntrainmentOwnFit(flvEnt, fair.details.percentFloodFair! / 100), 12);
    expect(kh.details.percentFloodKisterHaas).not.toBeCloseTo(kh.details.percentFloodFair!, 0);
  });
});

describe('dry trays', () => {
  it('no liquid: state dry, no phantom liquid head, liquid-side checks not applicable', () => {
    const req = inventedRequest();
    const dry = rateTray(req.section, { ...req.trays[0]!, liquidMassFlow_kg_h: 0 });
    expect(trayState(dry)).toBe('dry');
    expect(dry.details.clearLiquidHeight_mm).toBe(0);
    expect(dry.details.residualHead_mm).toBe(0);
    expect(dry.details.totalHead_mm).toBeCloseTo(dry.details.dryPressureDrop_mm, 12);
    expect(dry.details.entrainmentFraction).toBe(0);
    for (const c of [
      'entrainment',
      'weeping',
      'weirLoading',
      'liquidLoad',
      'downcomerBackup',
      'downcomerInletVelocity',
      'downcomerResidenceTime',
      'downcomerSeal',
    ] as const)
      expect(dry.checks[c].status, c).toBe('na');
    expect(dry.checks.jetFlood.status).not.toBe('na');
    expect(dry.checks.pressureDrop.status).not.toBe('na');
    expect(['jetFlood', 'pressureDrop']).toContain(dry.controllingCheck);
    expect(dry.warnings.find((w) => w.code === 'dry-tray')?.message).toMatch(/dry/);
  });
});

describe('downcomer seal check', () => {
  it('does not apply (status na, no "≥ 0" limit) when the clearance is below the weir height', () => {
    const req = inventedRequest();
    const sealed = rateTray({ ...req.section, downcomerClearance_mm: 40, weirHeight_mm: 50 }, req.trays[0]!);
    expect(sealed.checks.downcomerSeal.status).toBe('na');
    const open = rateTray({ ...req.section, downcomerClearance_mm: 150, weirHeight_mm: 25 }, req.trays[0]!);
    expect(open.checks.downcomerSeal.status).not.toBe('na');
  });
});

describe('section coverage', () => {
  it('says how many trays of a section were rated and which had no loads', () => {
    const c = sectionCoverage(9, 30, [...Array.from({ length: 12 }, (_, i) => 9 + i), 40]);
    expect(c).toEqual({ rated: 12, total: 22, missing: Array.from({ length: 10 }, (_, i) => 21 + i) });
    expect(coverageSentence(c)).toBe('rated 12 of 22 trays; no loads for trays 21–30');
    expect(coverageSentence(sectionCoverage(1, 3, [1, 2, 3]))).toBe('all 3 trays rated');
    expect(trayRuns([9, 1, 2, 3, 7, 10])).toBe('1–3, 7, 9–10');
  });
});

describe('pump-around study and dry trays', () => {
  it('a watched minimum-liquid check of a tray run dry counts as past its limit (the scan still sees the crossing)', async () => {
    const { checkResidual } = await import('../../../server/engine/pumpAround/checks.js');
    const req = inventedRequest();
    const dry = rateTray(req.section, { ...req.trays[0]!, liquidMassFlow_kg_h: 0 });
    expect(dry.checks.liquidLoad.status).toBe('na');
    expect(checkResidual(dry.checks.liquidLoad)).toBeGreaterThan(0);
    expect(checkResidual(dry.checks.weeping)).toBeGreaterThan(0);
  });
});
