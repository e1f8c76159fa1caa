import { describe, expect, it } from 'vitest';
import { backoffSeconds, MAX_ATTEMPTS } from '../../server/src/mail/outbox';

describe('outbox retry schedule', () => {
  it('doubles from 5 seconds and never waits more than an hour', () => {
    expect([1, 2, 3, 4].map(backoffSeconds)).toEqual([5, 10, 20, 40]);
    expect(backoffSeconds(30)).toBe(3600);
  });
  it('keeps trying for more than a day before it gives up', () => {
    let total = 0;
    for (let n = 1; n < MAX_ATTEMPTS; n++) total += backoffSeconds(n);
    expect(total).toBeGreaterThan(24 * 3600);
  });
});
