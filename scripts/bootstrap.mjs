// Entry of `npm start` and `npm test`: needs nothing but Node itself, so it can
// install the project's dependencies before handing over to the TypeScript tasks.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const task = process.argv[2];
const tasks = { start: 'scripts/start.ts', test: 'scripts/test.ts' };

function step(message) {
  console.log(`\u25b8 ${message}`);
}

function fail(message, fix) {
  console.error(`\u2716 ${message}\n  How to fix: ${fix}`);
  process.exit(1);
}

function checkNode() {
  const [major, minor] = process.versions.node.split('.').map(Number);
  if (major < 20 || (major === 20 && minor < 19)) {
    fail(`Node ${process.versions.node} is too old.`, 'install Node 20.19 or newer (Node 20 LTS).');
  }
}

function dependenciesAreCurrent() {
  const marker = join(root, 'node_modules', '.package-lock.json');
  const lock = join(root, 'package-lock.json');
  if (!existsSync(marker)) return false;
  return !existsSync(lock) || statSync(marker).mtimeMs >= statSync(lock).mtimeMs;
}

function installDependencies() {
  const useCi = existsSync(join(root, 'package-lock.json'));
  step(`Installing npm dependencies (npm ${useCi ? 'ci' : 'install'}); this takes a minute or two the first time`);
  const result = spawnSync('npm', [useCi ? 'ci' : 'install', '--no-audit', '--no-fund'], {
    cwd: root,
    stdio: 'inherit',
  });
  if (result.status !== 0) {
    fail('npm could not install the dependencies.', 'check the network access to the npm registry, then run the command again.');
  }
}

if (!tasks[task]) fail(`Unknown task "${task}".`, 'use `npm start` or `npm test`.');
checkNode();
if (dependenciesAreCurrent()) step('npm dependencies are installed');
else installDependencies();

const child = spawn(join(root, 'node_modules', '.bin', 'tsx'), [tasks[task], ...process.argv.slice(3)], {
  cwd: root,
  stdio: 'inherit',
});
// The task handles Ctrl-C itself (it shuts the database down); just wait for it.
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
