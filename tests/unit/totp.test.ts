import { describe, expect, it } from 'vitest';
import { checkTotpCode, newTotpSecret, openTotpSecret, sealTotpSecret, totpCodeAt } from '../../server/src/auth/totp';

/** RFC 6238 Appendix B: the SHA-1 seed is the ASCII string "12345678901234567890", 30-second steps, 8 digits. */
const RFC_SEED = new TextEncoder().encode('12345678901234567890');

describe('time-based codes', () => {
  it('match the SHA-1 test vectors of RFC 6238 Appendix B', async () => {
    expect(await totpCodeAt(RFC_SEED, 59, 8)).toBe('94287082'); // RFC 6238 Appendix B, T = 59
    expect(await totpCodeAt(RFC_SEED, 1111111109, 8)).toBe('07081804'); // RFC 6238 Appendix B, T = 1111111109
    expect(await totpCodeAt(RFC_SEED, 1111111111, 8)).toBe('14050471'); // RFC 6238 Appendix B, T = 1111111111
    expect(await totpCodeAt(RFC_SEED, 1234567890, 8)).toBe('89005924'); // RFC 6238 Appendix B, T = 1234567890
    expect(await totpCodeAt(RFC_SEED, 2000000000, 8)).toBe('69279037'); // RFC 6238 Appendix B, T = 2000000000
  });

  it('accepts an RFC 6238 Appendix B code at its time and one step either side, never twice', async () => {
    // RFC 6238 Appendix B: at T = 1111111109 the code is 07081804; its step is floor(1111111109 / 30) = 37037036.
    const step = await checkTotpCode(RFC_SEED, '07081804', { epoch: 1111111109, digits: 8 });
    expect(step).toBe(37037036);
    expect(await checkTotpCode(RFC_SEED, '07081804', { epoch: 1111111109 + 30, digits: 8 })).toBe(37037036);
    expect(await checkTotpCode(RFC_SEED, '07081804', { epoch: 1111111109 + 90, digits: 8 })).toBeNull();
    expect(await checkTotpCode(RFC_SEED, '07081804', { epoch: 1111111109, digits: 8, afterStep: step })).toBeNull();
    expect(await checkTotpCode(RFC_SEED, '07081805', { epoch: 1111111109, digits: 8 })).toBeNull();
    expect(await checkTotpCode(RFC_SEED, 'abc', { epoch: 1111111109, digits: 8 })).toBeNull();
  });

  it('keeps the secret sealed at rest and opens it only with the same session secret', () => {
    const secret = newTotpSecret();
    const sealed = sealTotpSecret(secret, 's'.repeat(40));
    expect(sealed).not.toContain(secret);
    expect(openTotpSecret(sealed, 's'.repeat(40))).toBe(secret);
    expect(openTotpSecret(sealed, 't'.repeat(40))).toBeNull();
    expect(openTotpSecret(sealed.slice(0, -2) + (sealed.endsWith('AA') ? 'BB' : 'AA'), 's'.repeat(40))).toBeNull();
  });
});
