/** Benches that need the database or the HTTP server (run by bench/run.ts). */
export const benches: { name: string; run: () => Promise<string> }[] = [];
