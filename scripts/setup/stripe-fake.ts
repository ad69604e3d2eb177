import { Server } from 'node:http';
import { SetupError } from './step-log';

/** A running Stripe fake (stripe-stateful-mock) on loopback; its state lives in memory until `stop()`. */
export interface StripeFake {
  host: string;
  port: number;
  stop(): Promise<void>;
}

/** The environment variables that point the server's Stripe SDK at the fake. */
export function stripeFakeEnv(fake: StripeFake): Record<string, string> {
  return { STRIPE_API_HOST: fake.host, STRIPE_API_PORT: String(fake.port), STRIPE_API_PROTOCOL: 'http', STRIPE_SECRET_KEY: 'sk_test_commonwort_local' };
}

/** Starts the fake from code on 127.0.0.1 (its own command line would listen on every interface). */
export async function startStripeFake(port: number): Promise<StripeFake> {
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const log = require('loglevel') as { setLevel(level: string): void };
  log.setLevel('warn');
  // eslint-disable-next-line @typescript-eslint/no-require-imports
  const { createExpressApp } = require('stripe-stateful-mock') as { createExpressApp(): { listen(port: number, host: string): Server } };
  const server = createExpressApp().listen(port, '127.0.0.1');
  await new Promise<void>((resolve, reject) => {
    server.once('listening', resolve);
    server.once('error', (error: NodeJS.ErrnoException) =>
      reject(new SetupError(`The Stripe fake could not listen on 127.0.0.1:${port} (${error.code ?? error.message}).`, 'stop what uses the port or set STRIPE_FAKE_PORT to a free one.')),
    );
  });
  const { port: bound } = server.address() as { port: number };
  return {
    host: '127.0.0.1',
    port: bound,
    stop: () =>
      new Promise((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
