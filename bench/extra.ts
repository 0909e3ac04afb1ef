import { benchImportPreview, benchRunCreate } from './api.js';

/** Benches that need the database or the HTTP server (run by bench/run.ts). */
export const benches: { name: string; run: () => Promise<string> }[] = [];
benches.push({ name: 'api runs', run: () => benchRunCreate() }, { name: 'api import', run: () => benchImportPreview() });
