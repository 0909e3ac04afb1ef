import { Foundation1764633600000 } from './1764633600000-Foundation.js';

/** Every migration in order; add new ones at the end. */
export const migrations = [Foundation1764633600000];
