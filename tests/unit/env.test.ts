import { describe, expect, it } from 'vitest';
import { loadEnv } from '../../server/src/config/env';

describe('environment at boot', () => {
  const base = { SESSION_SECRET: 'x'.repeat(40) };
  it('fills the documented defaults', () => {
    const env = loadEnv(base);
    expect(env.PORT).toBe(3000);
    expect(env.DB_PORT).toBe(3307);
    expect(env.publicUrl).toBe('http://127.0.0.1:3000');
    expect(env.dbUrl).toBe('mysql://mendery_app:@127.0.0.1:3307/mendery');
  });
  it('stops with a message that names the wrong variable', () => {
    expect(() => loadEnv({ ...base, PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => loadEnv({ SESSION_SECRET: 'short' })).toThrow(/SESSION_SECRET must be at least 32 characters/);
  });
});
