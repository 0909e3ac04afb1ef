/**
 * Password policy for every password a person sets (new user, own change, administrator reset): at least
 * 12 characters, at most 72 bytes in UTF-8 (bcrypt uses only the first 72 bytes, so a longer password
 * would be silently cut), and not easy to guess: zxcvbn-ts strength score 3 or more of 4, counting the
 * user's own e-mail and name as guessable words.
 */
import { ZxcvbnFactory } from '@zxcvbn-ts/core';
import * as common from '@zxcvbn-ts/language-common';
import * as en from '@zxcvbn-ts/language-en';
import { ValidationError } from '../../errors.js';
import { PASSWORD_RULES } from '../../../shared/contract/auth.js';

const { minLength: PASSWORD_MIN_LENGTH, maxBytes: PASSWORD_MAX_BYTES, minScore: PASSWORD_MIN_SCORE } = PASSWORD_RULES;

let checker: ZxcvbnFactory | null = null;
// built on first use: the dictionaries take a moment to load and most requests never need them
const strength = (): ZxcvbnFactory =>
  (checker ??= new ZxcvbnFactory({
    translations: en.translations,
    graphs: common.adjacencyGraphs,
    dictionary: { ...common.dictionary, ...en.dictionary },
  }));

/** What is wrong with a new password (a message to show after the field name), or null when it is acceptable. */
export function passwordProblem(password: string, userInputs: string[] = []): string | null {
  const bytes = Buffer.byteLength(password, 'utf8');
  if (bytes > PASSWORD_MAX_BYTES)
    return `is ${bytes} bytes long in UTF-8; at most ${PASSWORD_MAX_BYTES} bytes are allowed (the password hash uses no more)`;
  if ([...password].length < PASSWORD_MIN_LENGTH) return `must be at least ${PASSWORD_MIN_LENGTH} characters long`;
  const inputs = userInputs.flatMap((s) => [s, ...s.split(/[@.\s_-]+/)]).filter((s) => s.length >= 3);
  const r = strength().check(password, inputs);
  if (r.score >= PASSWORD_MIN_SCORE) return null;
  const why = [r.feedback.warning, ...r.feedback.suggestions].filter(Boolean).join(' ');
  return `is too easy to guess (strength ${r.score} of 4, at least ${PASSWORD_MIN_SCORE} needed)${why ? `: ${why}` : ''}`;
}

/** 400 naming the field when the password breaks the policy. */
export function assertPasswordAcceptable(field: string, password: string, userInputs: string[]): void {
  const problem = passwordProblem(password, userInputs);
  if (problem) throw new ValidationError('This password cannot be used', [{ path: field, message: problem }]);
}
