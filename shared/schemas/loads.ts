/**
 * Load-case schemas under their old names, for the routes not yet declared by a contract (imports, studies).
 * The schemas themselves are the contracts' (shared/contract/loads.ts, runs.ts).
 */
export { StageMapSchema as stageMapSchema } from '../contract/loads.js';
