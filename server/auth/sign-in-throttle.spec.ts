import { createSignInThrottle } from './sign-in-throttle';

describe('createSignInThrottle', () => {
  const limits = { perAccountAndAddress: 2, perAddress: 3, windowSeconds: 60 };

  it('when failures for one account and address reach the limit, then the next try is refused with 429 and a retry time', async () => {
    const throttle = createSignInThrottle(limits);
    await throttle.recordFailure('a@b.example', '10.0.0.1');
    await throttle.recordFailure('A@B.example', '10.0.0.1');
    await expect(throttle.assertAllowed('a@b.example', '10.0.0.1')).rejects.toMatchObject({ status: 429, code: 'too-many-attempts', retryAfterSeconds: expect.any(Number) });
  });

  it('when the same account is tried from another address, then that address is still allowed', async () => {
    const throttle = createSignInThrottle(limits);
    await throttle.recordFailure('a@b.example', '10.0.0.1');
    await throttle.recordFailure('a@b.example', '10.0.0.1');
    await expect(throttle.assertAllowed('a@b.example', '10.0.0.2')).resolves.toBeUndefined();
  });

  it('when one address fails across many accounts, then the address limit applies', async () => {
    const throttle = createSignInThrottle(limits);
    for (const email of ['x@b.example', 'y@b.example', 'z@b.example']) await throttle.recordFailure(email, '10.0.0.9');
    await expect(throttle.assertAllowed('fresh@b.example', '10.0.0.9')).rejects.toMatchObject({ status: 429 });
  });

  it('when a sign-in succeeds, then the account counter starts again', async () => {
    const throttle = createSignInThrottle(limits);
    await throttle.recordFailure('a@b.example', '10.0.0.1');
    await throttle.recordSuccess('a@b.example', '10.0.0.1');
    await throttle.recordFailure('a@b.example', '10.0.0.1');
    await expect(throttle.assertAllowed('a@b.example', '10.0.0.1')).resolves.toBeUndefined();
  });
});
