import { ChildProcess, spawn } from 'node:child_process';
import { join } from 'node:path';
import { freePort } from '../../../scripts/setup/free-port';

const root = join(__dirname, '..', '..', '..');

/** A real server process (`server/main.ts`, scheduler on) against the test database. */
export interface ServerProcess {
  pid: number;
  /** Where it listens, e.g. http://127.0.0.1:40123. */
  baseUrl: string;
  stop(): Promise<void>;
}

/** Starts the server as its own process with `env` on top of the test settings; resolves once it listens. */
export async function startServerProcess(env: Record<string, string>): Promise<ServerProcess> {
  const port = await freePort();
  const child: ChildProcess = spawn(join(root, 'node_modules', '.bin', 'tsx'), ['server/main.ts'], {
    cwd: root,
    env: { ...process.env, LOG_LEVEL: 'silent', PORT: String(port), HOST: '127.0.0.1', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`The server process did not start within 30 s:\n${output}`)), 30_000);
    child.stdout!.on('data', (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes('listening')) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.once('exit', (code) => reject(new Error(`The server process ended (${code}):\n${output}`)));
  });
  return {
    pid: child.pid!,
    baseUrl: `http://127.0.0.1:${port}`,
    stop: () =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}
