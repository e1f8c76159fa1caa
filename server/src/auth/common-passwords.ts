import { dictionary } from '@zxcvbn-ts/language-common';
import { HttpError } from '../http/errors';

/**
 * The 49,000-odd most common passwords from published breach lists, as @zxcvbn-ts/language-common ships them
 * (ranked by how often they appear). Loaded on first use and kept: the check needs no network.
 */
let common: Set<string> | null = null;
const list = () => (common ??= new Set(dictionary['passwords-common'].map((p) => p.toLowerCase())));

/** Whether a password is on the list, ignoring case and spaces around it (“Password123 ” counts). */
export function isCommonPassword(password: string): boolean {
  return list().has(password.trim().toLowerCase());
}

export const COMMON_PASSWORD_MESSAGE =
  'That password is on a list of passwords that are often used or have leaked. Choose one of your own.';

/** Refuses a new password from the list, with the field the form shows it beside; call before hashing. */
export function refuseCommonPassword(password: string, field = 'password'): void {
  if (isCommonPassword(password))
    throw new HttpError(400, 'password-common', COMMON_PASSWORD_MESSAGE, { [field]: COMMON_PASSWORD_MESSAGE });
}
