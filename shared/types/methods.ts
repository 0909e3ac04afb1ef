/** GET /methods: the engine's correlations and default limits with their sources (for reports and tooltips). */
export interface MethodInfo {
  /** correlation id; `CheckResult.method` values are ids */
  id: string;
  label: string;
  source: string;
  equation: string;
  provenance: 'seen' | 'recalled' | 'derived' | 'common-practice' | 'own-fit';
  ranges: Record<string, readonly [number, number]>;
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
