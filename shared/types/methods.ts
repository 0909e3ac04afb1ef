/**
 * GET /methods: the engine's correlations and default limits with their sources (for reports and tooltips),
 * defined once by the contract (shared/contract/methods.ts) and re-exported here.
 */
export type { LimitInfo, MethodInfo, MethodsPayload } from '../contract/methods.js';
