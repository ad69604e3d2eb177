import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { done, SetupError, step } from './step-log';

const INPUTS = ['src', 'shared', 'fonts', 'angular.json', 'tsconfig.json', 'tsconfig.app.json', 'package-lock.json'];

function newestChange(path: string): number {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return readdirSync(path).reduce((newest, entry) => Math.max(newest, newestChange(join(path, entry))), stat.mtimeMs);
}

/** Builds the Angular app unless the last build is newer than every input. */
export function buildClientIfStale(root: string, distDir: string): void {
  const index = join(root, distDir, 'index.html');
  const built = existsSync(index) ? statSync(index).mtimeMs : 0;
  const changed = Math.max(...INPUTS.map((input) => newestChange(join(root, input))));
  if (built > changed) {
    done('The web app build is up to date');
    return;
  }
  step('Building the web app (ng build, about 20-40 s)');
  const result = spawnSync(join(root, 'node_modules', '.bin', 'ng'), ['build'], { cwd: root, stdio: 'inherit', env: { ...process.env, NG_CLI_ANALYTICS: 'false' } });
  if (result.status !== 0) throw new SetupError('The web app did not build (see the compiler messages above).', 'fix the errors shown, then run the command again.');
}
