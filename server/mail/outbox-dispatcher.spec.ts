import { MAX_SEND_ATTEMPTS, retryDelayMs } from './outbox-dispatcher';

describe('outbox retry backoff', () => {
  it('retryDelayMs doubles from 30 s after each failed attempt', () => {
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([30_000, 60_000, 120_000, 240_000]);
  });

  it('retryDelayMs never waits more than an hour', () => {
    expect(retryDelayMs(MAX_SEND_ATTEMPTS)).toBe(3_600_000);
  });
});
