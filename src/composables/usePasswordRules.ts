import { PASSWORD_RULES } from '../../shared/contract/auth';

/**
 * The length checks of the server's password policy, as q-input rules (the server also checks that a
 * password is hard to guess and says why when it is not).
 */
export const newPasswordRules = [
  (v: string): true | string => [...v].length >= PASSWORD_RULES.minLength || `At least ${PASSWORD_RULES.minLength} characters`,
  (v: string): true | string =>
    new TextEncoder().encode(v).length <= PASSWORD_RULES.maxBytes ||
    `At most ${PASSWORD_RULES.maxBytes} bytes (accented letters and symbols count 2–4 each)`,
];

/** A random temporary password an administrator can pass on: 16 letters and digits, easy to read aloud. */
export function randomTemporaryPassword(): string {
  const alphabet = 'abcdefghjkmnpqrstuvwxyzABCDEFGHJKLMNPQRSTUVWXYZ23456789';
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  const chars = [...bytes].map((b) => alphabet[b % alphabet.length]).join('');
  return `${chars.slice(0, 4)}-${chars.slice(4, 8)}-${chars.slice(8, 12)}-${chars.slice(12)}`;
}
