import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { SetupError, step } from './step-log';

/** Where and how one private MariaDB server of the project runs. */
export interface PrivateMariaDbOptions {
  /** Folder holding datadir, socket, pid and log, e.g. .data/dev */
  home: string;
  port: number;
}

/** A running private server; `stop()` shuts it down cleanly. */
export interface PrivateMariaDb {
  port: number;
  socket: string;
  /** Runs SQL as root over the socket. */
  runSql(sql: string): void;
  stop(): void;
}

function paths(home: string) {
  return {
    datadir: join(home, 'mysql'),
    socket: join(home, 'mysqld.sock'),
    pidFile: join(home, 'mysqld.pid'),
    logFile: join(home, 'mysqld.log'),
    portFile: join(home, 'mysqld.port'),
  };
}

function ping(socket: string): boolean {
  const result = spawnSync('mariadb-admin', ['--no-defaults', `--socket=${socket}`, '-uroot', 'ping'], {
    stdio: 'ignore',
  });
  return result.status === 0;
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

function readPid(pidFile: string): number | null {
  if (!existsSync(pidFile)) return null;
  const pid = Number(readFileSync(pidFile, 'utf8').trim());
  return Number.isInteger(pid) && pid > 0 ? pid : null;
}

function initialise(datadir: string): void {
  step(`Creating a new MariaDB data folder in ${datadir}`);
  mkdirSync(datadir, { recursive: true });
  const result = spawnSync(
    'mariadb-install-db',
    [
      '--no-defaults',
      `--datadir=${datadir}`,
      '--user=root',
      '--auth-root-authentication-method=normal',
      '--skip-test-db',
      '--skip-name-resolve',
    ],
    { encoding: 'utf8' },
  );
  if (result.status !== 0) {
    rmSync(datadir, { recursive: true, force: true });
    throw new SetupError(`mariadb-install-db failed: ${result.stderr || result.stdout}`, 'check the disk space and that mariadb-server is installed.');
  }
}

/** Clears what a crashed server left behind, or says whether a live one of ours can be reused. */
function handleLeftovers(p: ReturnType<typeof paths>): 'reuse' | 'clean' {
  const pid = readPid(p.pidFile);
  if (pid && processAlive(pid) && ping(p.socket)) return 'reuse';
  if (pid && processAlive(pid)) {
    step(`Stopping an unresponsive MariaDB left over (pid ${pid})`);
    process.kill(pid, 'SIGKILL');
  }
  if (existsSync(p.pidFile) || existsSync(p.socket)) step('Removing a stale pid file and socket from an earlier run');
  rmSync(p.pidFile, { force: true });
  rmSync(p.socket, { force: true });
  return 'clean';
}

async function waitUntilReady(p: ReturnType<typeof paths>, port: number, home: string, exited: () => boolean): Promise<void> {
  const { socket, logFile } = p;
  for (let i = 0; i < 300; i++) {
    if (ping(socket)) return;
    if (exited()) break;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  const log = existsSync(logFile) ? readFileSync(logFile, 'utf8').split('\n').slice(-15).join('\n') : '(no log)';
  throw new SetupError(
    `The private MariaDB did not start. Last lines of ${logFile}:\n${log}`,
    `if port ${port} is taken, stop what uses it or choose another port (DB_PORT for npm start, TEST_DB_PORT for npm test); if the data folder is damaged, delete ${home} and run again.`,
  );
}

function launch(p: ReturnType<typeof paths>, port: number) {
  const child = spawn(
    'mariadbd',
    [
      '--no-defaults',
      `--datadir=${p.datadir}`,
      `--socket=${p.socket}`,
      `--port=${port}`,
      '--bind-address=127.0.0.1',
      '--user=root',
      `--pid-file=${p.pidFile}`,
      `--log-error=${p.logFile}`,
      '--skip-name-resolve',
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      '--innodb-log-file-size=16M',
    ],
    // Its own process group, so Ctrl-C reaches our handler and not the server directly.
    { detached: true, stdio: 'ignore' },
  );
  let exited = false;
  child.on('exit', () => (exited = true));
  child.unref();
  return () => exited;
}

/** Starts (or reuses) the private server whose files live in `home`. */
export async function startPrivateMariaDb({ home, port: requestedPort }: PrivateMariaDbOptions): Promise<PrivateMariaDb> {
  const p = paths(home);
  let port = requestedPort;
  if (!existsSync(join(p.datadir, 'mysql'))) initialise(p.datadir);
  if (handleLeftovers(p) === 'reuse' && existsSync(p.portFile)) {
    // A server left running keeps the port it was started on.
    port = Number(readFileSync(p.portFile, 'utf8'));
    step(`Reusing the private MariaDB already running on 127.0.0.1:${port}`);
  } else {
    writeFileSync(p.portFile, String(port));
    step(`Starting a private MariaDB on 127.0.0.1:${port} (data in ${p.datadir})`);
    await waitUntilReady(p, port, home, launch(p, port));
  }
  return {
    port,
    socket: p.socket,
    runSql(sql: string) {
      const result = spawnSync('mariadb', ['--no-defaults', `--socket=${p.socket}`, '-uroot'], { input: sql, encoding: 'utf8' });
      if (result.status !== 0) throw new SetupError(`SQL failed: ${result.stderr}`, 'see the message above.');
    },
    stop() {
      step('Stopping the private MariaDB');
      spawnSync('mariadb-admin', ['--no-defaults', `--socket=${p.socket}`, '-uroot', 'shutdown'], { stdio: 'ignore' });
    },
  };
}
