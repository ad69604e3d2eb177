import { ChildProcess, spawn } from 'node:child_process';
import { join } from 'node:path';
import { Config } from '@server/config';
import { freePort } from '../../../scripts/setup/free-port';

/** The server as its own operating-system process (`server/main.ts`, scheduler on), as it runs in production. */
export interface ServerProcess {
  pid: number;
  baseUrl: string;
  child: ChildProcess;
  /** Everything it wrote to stdout and stderr. */
  output(): string;
  alive(): boolean;
  stop(): Promise<void>;
}

const root = join(__dirname, '..', '..', '..');

async function waitForHealth(baseUrl: string, child: ChildProcess, output: () => string): Promise<void> {
  // Generous: tsx compiles the whole server first, and a loaded machine makes that slow.
  for (let i = 0; i < 800; i++) {
    if (child.exitCode !== null) break;
    const ok = await fetch(`${baseUrl}/api/health`).then((res) => res.ok, () => false);
    if (ok) return;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  child.kill('SIGTERM');
  throw new Error(`The server process did not come up:\n${output()}`);
}

/**
 * Starts `server/main.ts` on a free port with `env` on top of the test settings, against the test
 * database or `config`'s; it trusts one proxy hop (tests send X-Forwarded-For). Resolves once healthy.
 */
export async function startServerProcess(env: Record<string, string> = {}, config?: Config): Promise<ServerProcess> {
  const port = await freePort();
  const database = config ? { DB_PORT: String(config.db.port), DB_NAME: config.db.database } : {};
  const child = spawn(join(root, 'node_modules', '.bin', 'tsx'), [join(root, 'server', 'main.ts')], {
    cwd: root,
    env: { ...process.env, HOST: '127.0.0.1', PORT: String(port), TRUST_PROXY: '1', LOG_LEVEL: 'warn', ...database, ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout!.on('data', (chunk) => (log += chunk));
  child.stderr!.on('data', (chunk) => (log += chunk));
  const baseUrl = `http://127.0.0.1:${port}`;
  const output = () => log;
  await waitForHealth(baseUrl, child, output);
  return {
    pid: child.pid!,
    baseUrl,
    child,
    output,
    alive: () => child.exitCode === null && child.signalCode === null,
    async stop() {
      if (child.exitCode !== null || child.signalCode !== null) return;
      const exited = new Promise((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      await exited;
    },
  };
}
