/** GET /methods: the engine's correlations and default limits with their sources (for reports and tooltips). */
export interface MethodInfo {
  /** correlation id; `CheckResult.method` values are ids */
  id: string;
  label: string;
  /** the published source, in plain words (no drafting notes) */
  source: string;
  equation: string;
  provenance: 'seen' | 'recalled' | 'derived' | 'common-practice' | 'own-fit';
  ranges: Record<string, readonly [number, number]>;
  /** the uncertainty a report states once for this correlation, or null */
  uncertainty: string | null;
  /** ids of the correlations this one relies on (listed with it in reports) */
  uses: readonly string[];
}

export interface LimitInfo {
  check: string;
  limit: number;
  unit: string;
  sense: string;
  note: string;
  source: string;
}

export interface MethodsPayload {
  engineVersion: string;
  methods: MethodInfo[];
  limits: LimitInfo[];
  /** the cautions every rating report carries */
  cautions: string[];
}
