// Throughput of the API as ratios to a baseline measured in the same run: the signed-in recipe
// list against a bare Express route running the same query without sessions (50 concurrent clients),
// and /api/health latency while made-up invitation tokens are submitted in a burst.
import autocannon from 'autocannon';
import { BENCH_PASSWORD, startBenchServers } from './bench-server';

const CONNECTIONS = 50;
const SECONDS = 4;

function run(options: autocannon.Options): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => {
    autocannon({ duration: SECONDS, ...options }, (err, result) => (err ? reject(err) : resolve(result)));
  });
}

/** Signs the bench member in and returns the cookies and CSRF header to send. */
async function signIn(appUrl: string, email: string): Promise<Record<string, string>> {
  const probe = await fetch(`${appUrl}/api/auth/session`);
  const xsrf = /XSRF-TOKEN=([^;]+)/.exec(probe.headers.getSetCookie().join(';'))![1];
  const res = await fetch(`${appUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: `XSRF-TOKEN=${xsrf}`, 'x-xsrf-token': xsrf },
    body: JSON.stringify({ email, password: BENCH_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`Bench sign-in failed: ${res.status}`);
  const cookies = res.headers.getSetCookie().map((c) => c.split(';')[0]);
  const token = /XSRF-TOKEN=([^;]+)/.exec(cookies.join(';'))![1];
  return { cookie: cookies.join('; '), 'x-xsrf-token': token };
}

function line(name: string, value: string, ratio: string): string {
  return `${name.padEnd(52)} ${value.padStart(14)}   ${ratio}\n`;
}

export async function runApiBench(): Promise<void> {
  process.stdout.write('\nAPI benchmark (own MariaDB in .data/bench, starting…)\n');
  const servers = await startBenchServers();
  try {
    const headers = await signIn(servers.appUrl, servers.user.email);
    // Warm-up, then baseline and app alternately; the better of two rounds of each is kept.
    await run({ url: `${servers.bareUrl}/bare/recipes`, connections: 10, duration: 1 });
    await run({ url: `${servers.appUrl}/api/recipes`, connections: 10, duration: 1, headers });
    const bare: number[] = [];
    const full: number[] = [];
    for (let round = 0; round < 2; round++) {
      bare.push((await run({ url: `${servers.bareUrl}/bare/recipes`, connections: CONNECTIONS })).requests.average);
      const app = await run({ url: `${servers.appUrl}/api/recipes`, connections: CONNECTIONS, headers });
      if (app.non2xx > 0) throw new Error(`The app answered ${app.non2xx} requests with an error status`);
      full.push(app.requests.average);
    }
    const baseline = Math.max(...bare);
    const app = Math.max(...full);
    process.stdout.write(`Recipe list, ${CONNECTIONS} concurrent clients, ${SECONDS} s per round\n`);
    process.stdout.write(line('bare Express route, same query (baseline)', `${Math.round(baseline)} req/s`, '1.00 × baseline'));
    process.stdout.write(line('signed-in GET /api/recipes (sessions, CSRF, guard)', `${Math.round(app)} req/s`, `${(app / baseline).toFixed(2)} × baseline`));

    const idle = await run({ url: `${servers.appUrl}/api/health`, connections: 1, duration: 2 });
    const burstHeaders = { 'content-type': 'application/json', cookie: `XSRF-TOKEN=${'b'.repeat(32)}`, 'x-xsrf-token': 'b'.repeat(32) };
    const [underBurst, burst] = await Promise.all([
      run({ url: `${servers.appUrl}/api/health`, connections: 1, duration: 2 }),
      run({ url: `${servers.appUrl}/api/invitations/${'x'.repeat(43)}/acceptance`, method: 'POST', connections: 16, duration: 2, headers: burstHeaders, body: JSON.stringify({ name: 'Nobody', password: 'a long enough password' }) }),
    ]);
    process.stdout.write(`/api/health latency, idle and during 16 parallel acceptances of made-up invitation tokens (${Math.round(burst.requests.average)} req/s, all refused before hashing)\n`);
    process.stdout.write(line('health p50 idle (baseline)', `${idle.latency.p50} ms`, '1.00 × baseline'));
    process.stdout.write(line('health p50 during the burst', `${underBurst.latency.p50} ms`, `${(underBurst.latency.p50 / Math.max(idle.latency.p50, 1)).toFixed(2)} × baseline (p50 of ≥ 1 ms)`));
  } finally {
    await servers.stop();
  }
}
