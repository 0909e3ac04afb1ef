import { describe, expect, it } from 'vitest';
import { crestOverWeirFrancis, weirLoadingForCrestFrancis, weirLoadingVolumetric } from '../../../server/engine/weir.js';
import { apronHeadLoss, downcomerResidenceTimeApparent, downcomerSealKister } from '../../../server/engine/downcomer.js';
import { rateTray } from '../../../server/engine/rateTray.js';
import { inventedRequest, rel } from './fixtures.js';

describe('Francis weir crest (F_w = 1)', () => {
  it('agrees with the English form 0.48 (gpm/in)^(2/3) in (Perry 8th Sec. 14, from memory) within 1 %', () => {
    for (const gpmPerIn of [0.5, 2, 8]) {
      const q = gpmPerIn * 6.30902e-5; // m³/s per inch of weir
      const mm = crestOverWeirFrancis(q, 0.0254);
      expect(Math.abs(rel(mm / 25.4, 0.48 * Math.pow(gpmPerIn, 2 / 3)))).toBeLessThan(0.01);
    }
  });
  it('6 mm crest ⇔ 3.09 m³/(h·m) (reference sheet §5.3, derived) and loading units', () => {
    expect(Math.abs(rel(weirLoadingForCrestFrancis(6), 3.09))).toBeLessThan(0.01);
    expect(crestOverWeirFrancis(3.09 / 3600, 1)).toBeCloseTo(6, 1);
    // 1 gpm/in = 8.942 m³/(h·m) (reference sheet §1, derived)
    expect(Math.abs(rel(weirLoadingVolumetric(6.30902e-5, 0.0254), 8.942))).toBeLessThan(0.001);
  });
});

describe('downcomer', () => {
  it('apron head loss reproduces Sinnott Example 11.11 (from memory) and the Kister English form', () => {
    // Sinnott C&R Vol. 6 Ex. 11.11: L 2.54 kg/s, ρL 954, A_m 0.024 m² → "2 mm"
    expect(Math.abs(apronHeadLoss(2.54 / 954, 0.024) - 2)).toBeLessThan(0.1);
    // Kister (1992) English form h_da = 0.03 (gpm/(100 A_da))² in (from memory): 500 gpm, 1 ft²
    expect(Math.abs(rel(apronHeadLoss(500 * 6.30902e-5, 0.09290304) / 25.4, 0.03 * 25))).toBeLessThan(0.01);
  });
  it('apparent residence time and seal margin follow their definitions', () => {
    expect(downcomerResidenceTimeApparent(0.2, 0.1, 600, 0.01)).toBeCloseTo(9, 6);
    expect(downcomerSealKister(170, 60)).toBe(110);
  });
  it("applies Kister's 2-in seal rule only when the clearance exceeds the weir height", () => {
    const req = inventedRequest();
    const load = { ...req.trays[0]!, liquidMassFlow_kg_h: 8000 };
    const sealed = rateTray({ ...req.section, downcomerClearance_mm: 40, weirHeight_mm: 50 }, load);
    expect(sealed.checks.downcomerSeal.limit).toBe(0);
    expect(sealed.checks.downcomerSeal.status).toBe('na'); // the weir seals the downcomer: no check to show
    const open = rateTray({ ...req.section, downcomerClearance_mm: 150, weirHeight_mm: 25 }, load);
    expect(open.checks.downcomerSeal.limit).toBe(51); // Kister (1992) §6.5: 2 in
    expect(open.checks.downcomerSeal.status).toBe('over');
    expect(open.warnings.some((w) => w.code === 'downcomer-unsealed')).toBe(true);
  });
});

describe('liquid load warnings', () => {
  it('names the picket-fence weir below a 6 mm crest and flags a dry tray (its crest check does not apply)', () => {
    const req = inventedRequest();
    const low = rateTray(req.section, { ...req.trays[0]!, liquidMassFlow_kg_h: 3000 });
    expect(low.checks.liquidLoad.status).toBe('over');
    expect(low.warnings.find((w) => w.code === 'low-crest')?.message).toMatch(/picket-fence/);
    const dry = rateTray(req.section, { ...req.trays[0]!, liquidMassFlow_kg_h: 0 });
    expect(dry.checks.liquidLoad.value).toBe(0);
    expect(dry.checks.liquidLoad.status).toBe('na');
    expect(dry.checks.liquidLoad.percentOfLimit).toBe(0);
    expect(dry.warnings.some((w) => w.code === 'dry-tray')).toBe(true);
  });
});
