import { computed, type Ref } from 'vue';
import { coverageSentence, sectionCoverage, trayRuns, trayState, type SectionCoverage } from '../../shared/verdict';
import type { TrayState } from '../../shared/types/rating';
import type { RunRecord, RunSectionResult } from '../../shared/types/runs';

export interface SectionVerdict {
  section: RunSectionResult;
  coverage: SectionCoverage;
  /** "all 22 trays rated" or "rated 12 of 22 trays; no loads for trays 21–30" */
  coverageText: string;
  flooded: number[];
  dry: number[];
}

/** Per-tray verdicts of a run (also for runs stored before trays had one) and per-section coverage. */
export function useRunVerdicts(run: Ref<RunRecord>) {
  const states = computed(() => new Map<number, TrayState>(run.value.results.trays.map((t) => [t.tray, trayState(t)])));
  const traysIn = (s: TrayState) => [...states.value].filter(([, v]) => v === s).map(([t]) => t);
  const flooded = computed(() => traysIn('flooded'));
  const dry = computed(() => traysIn('dry'));
  const over = computed(() => traysIn('over'));
  const near = computed(() => traysIn('near'));
  const sections = computed<SectionVerdict[]>(() =>
    run.value.results.sections.map((section) => {
      const trays = run.value.results.trays.filter((t) => t.sectionId === section.sectionId);
      const coverage = sectionCoverage(
        section.firstTray,
        section.lastTray,
        trays.map((t) => t.tray),
      );
      return {
        section,
        coverage,
        coverageText: coverageSentence(coverage),
        flooded: trays.filter((t) => states.value.get(t.tray) === 'flooded').map((t) => t.tray),
        dry: trays.filter((t) => states.value.get(t.tray) === 'dry').map((t) => t.tray),
      };
    }),
  );
  return { states, flooded, dry, over, near, sections, trayRuns };
}
