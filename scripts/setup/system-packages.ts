import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { SetupError, step } from './step-log';

/** Debian packages the project needs, with the file that shows each is installed. */
export const SYSTEM_PACKAGES = {
  'mariadb-server': '/usr/sbin/mariadbd',
  chromium: '/usr/bin/chromium',
} as const;

export type SystemPackage = keyof typeof SYSTEM_PACKAGES;

/** Installs the missing Debian packages with apt-get; the system services are never started. */
export function ensureSystemPackages(names: SystemPackage[]): void {
  const missing = names.filter((name) => !existsSync(SYSTEM_PACKAGES[name]));
  if (missing.length === 0) {
    step(`System packages present: ${names.join(', ')}`);
    return;
  }
  if (process.getuid?.() !== 0) {
    throw new SetupError(
      `Missing Debian packages: ${missing.join(', ')}, and this user cannot install them.`,
      `run \`sudo apt-get install -y ${missing.join(' ')}\`, then run the command again.`,
    );
  }
  step(`Installing Debian packages: ${missing.join(', ')} (apt-get; about a minute)`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const update = spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  const install = spawnSync('apt-get', ['install', '-y', '-qq', ...missing], { stdio: 'inherit', env });
  if (update.status !== 0 || install.status !== 0 || missing.some((n) => !existsSync(SYSTEM_PACKAGES[n]))) {
    throw new SetupError(
      `apt-get could not install ${missing.join(', ')}.`,
      `check access to Debian's package mirrors and run \`apt-get install -y ${missing.join(' ')}\` by hand.`,
    );
  }
}
