import { describe, expect, it } from 'vitest';
import { ARGON2_PARAMS, hashPassword, verifyPassword } from '../../server/src/auth/passwords';

describe('password hashing', () => {
  it('stores argon2id with the OWASP parameters m=19456 KiB, t=2, p=1', async () => {
    // Source: OWASP Password Storage Cheat Sheet (OWASP Foundation, 2024), "Argon2id" — first listed configuration.
    const stored = await hashPassword('a long enough passphrase');
    expect(stored).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$[A-Za-z0-9+/]{22}\$[A-Za-z0-9+/]{43}$/);
    expect(ARGON2_PARAMS).toMatchObject({ memoryCost: 19456, timeCost: 2, parallelism: 1 });
  });

  it('salts every hash, so the same password never hashes the same way twice', async () => {
    const [a, b] = await Promise.all([hashPassword('same words here'), hashPassword('same words here')]);
    expect(a).not.toBe(b);
  });

  it('verifies the right password and refuses a wrong one', async () => {
    const stored = await hashPassword('kettle descaling day');
    expect(await verifyPassword(stored, 'kettle descaling day')).toBe(true);
    expect(await verifyPassword(stored, 'kettle descaling dax')).toBe(false);
  });

  it('verifies a hash made by the Argon2 reference implementation', async () => {
    // Encoded hash printed by the reference CLI for `echo -n password | argon2 somesalt -t 2 -m 16 -p 4 -l 24`
    // (github.com/P-H-C/phc-winner-argon2 README, "Command-line utility"). From memory of that README.
    const reference = '$argon2i$v=19$m=65536,t=2,p=4$c29tZXNhbHQ$RdescudvJCsgt3ub+b+dWRWJTmaaJObG';
    expect(await verifyPassword(reference, 'password')).toBe(true);
    expect(await verifyPassword(reference, 'passwore')).toBe(false);
  });

  it('treats a malformed stored hash as a failed check, not a crash', async () => {
    expect(await verifyPassword('not-a-hash', 'anything')).toBe(false);
  });
});
