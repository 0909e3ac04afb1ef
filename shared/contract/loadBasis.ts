/** Why a load case was made; its own module so the runs contract (a run's snapshot) can use it without an import cycle. */
import type { Static } from '@sinclair/typebox';
import { StringEnum } from './schema.js';

export const LOAD_BASES = ['normal', 'maximum', 'minimum', 'alternative-feed', 'pump-around-study', 'other'] as const;
export const LoadBasisSchema = StringEnum(LOAD_BASES);
export type LoadBasis = Static<typeof LoadBasisSchema>;
