import { hash, verify } from '@node-rs/argon2';

/**
 * argon2id with the OWASP Password Storage Cheat Sheet's first option: m = 19 MiB, t = 2, p = 1.
 * https://cheatsheetseries.owasp.org/cheatsheets/Password_Storage_Cheat_Sheet.html
 */
export const ARGON2_PARAMS = {
  algorithm: 2 /* Algorithm.Argon2id (a const enum) */,
  memoryCost: 19456,
  timeCost: 2,
  parallelism: 1,
} as const;

/** At most this many argon2 runs at once per process (19 MiB each); the rest wait their turn. */
export const MAX_CONCURRENT_HASHES = 4;

/** Counts every argon2 run (hash or verify), so tests can tell that a refusal came before any hashing. */
export const argon2Runs = { started: 0, active: 0, peak: 0 };

const waiting: (() => void)[] = [];

async function limited<T>(work: () => Promise<T>): Promise<T> {
  if (argon2Runs.active >= MAX_CONCURRENT_HASHES) await new Promise<void>((go) => waiting.push(go));
  // A released slot is handed over without lowering `active`, so no newcomer can slip in between.
  else argon2Runs.active++;
  argon2Runs.started++;
  argon2Runs.peak = Math.max(argon2Runs.peak, argon2Runs.active);
  try {
    return await work();
  } finally {
    const next = waiting.shift();
    if (next) next();
    else argon2Runs.active--;
  }
}

export const hashPassword = (password: string): Promise<string> => limited(() => hash(password, ARGON2_PARAMS));

export async function verifyPassword(stored: string, password: string): Promise<boolean> {
  try {
    return await limited(() => verify(stored, password));
  } catch {
    return false;
  }
}

/** Verified against when the e-mail is unknown, so both failures take the same time. */
let dummy: Promise<string> | null = null;
export const dummyHash = (): Promise<string> => (dummy ??= hashPassword('not-a-real-password-0000'));
