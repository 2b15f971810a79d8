import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import { DEMO_PASSWORD, demoEmail } from '../../server/demo/people';

/**
 * The API under a class's load, measured against a bare Express endpoint in the same run: the real server
 * (`server/index.ts` with the demo data) and the bare app each run in their own process, autocannon in this one.
 */
const ROOT = path.resolve(import.meta.dirname, '..', '..');
const APP_PORT = 4417;
const BARE_PORT = 4418;
const base = (port: number) => `http://localhost:${port}`;
const CONNECTIONS = 64;
const SECONDS = 10;
const READ_RATIO = 0.25;
const LESSON_RATIO = 0.2;
const READ_P99_MS = 250;
const BURST = 100;
const HEALTH_P99_MS = 200;
const MIXED_CONNECTIONS = 200;
const MIXED_SECONDS = 30;
const MIXED_P99_MS = 1000;
const LESSON = '/api/courses/going-train-wall-regulator/lessons/broaching-pivot-holes';

function start(script: string, env: Record<string, string>, ready: (line: string) => boolean): Promise<ChildProcess> {
  const child = spawn('npx', ['tsx', script], { cwd: ROOT, env: { ...process.env, ...env }, stdio: 'pipe' });
  return new Promise((resolve, reject) => {
    child.stdout!.on('data', (chunk: Buffer) => {
      if (ready(String(chunk))) resolve(child);
    });
    child.stderr!.on('data', (chunk: Buffer) => process.stderr.write(chunk));
    child.on('exit', (code) => reject(new Error(`${script} stopped (${code}) before it was ready`)));
  });
}

async function signIn(key: string): Promise<string> {
  const res = await fetch(`${base(APP_PORT)}/api/auth/login`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: base(APP_PORT) },
    body: JSON.stringify({ email: demoEmail(key), password: DEMO_PASSWORD }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${key}: ${res.status}`);
  return res.headers.get('set-cookie')!.split(';')[0];
}

interface Figures {
  rps: number;
  p99: number;
  errors: number;
}

async function load(url: string, options: Partial<autocannon.Options> = {}): Promise<Figures> {
  const result = await autocannon({ url, connections: CONNECTIONS, duration: SECONDS, ...options });
  return {
    rps: result.requests.average,
    p99: result.latency.p99,
    errors: result.errors + result.non2xx + result.timeouts,
  };
}

/** One day of a class: many sign-ins reading, in parallel, measured once warm. */
async function measureReads(cookies: { apprentice: string; mentor: string }, bareRps: number) {
  const routes: [string, string, string, number][] = [
    ['/api/auth/me', '/api/auth/me', cookies.apprentice, READ_RATIO],
    ['/api/courses', '/api/courses', cookies.apprentice, READ_RATIO],
    ['a lesson', LESSON, cookies.apprentice, LESSON_RATIO],
    ['/api/log-entries', '/api/log-entries', cookies.apprentice, READ_RATIO],
    ['/api/submissions', '/api/submissions', cookies.apprentice, READ_RATIO],
    ['/api/review-queue', '/api/review-queue', cookies.mentor, READ_RATIO],
  ];
  let ok = true;
  for (const [label, route, cookie, target] of routes) {
    const url = `${base(APP_PORT)}${route}`;
    await load(url, { duration: 3, headers: { cookie } });
    const f = await load(url, { headers: { cookie } });
    const ratio = f.rps / bareRps;
    const pass = ratio >= target && f.p99 <= READ_P99_MS && f.errors === 0;
    ok &&= pass;
    console.log(
      `  ${label.padEnd(18)} ${f.rps.toFixed(0).padStart(6)} req/s  ${(ratio * 100).toFixed(0).padStart(3)} % of bare ` +
        `(target ${target * 100} %)  p99 ${f.p99} ms  errors ${f.errors}  ${pass ? 'OK' : 'BELOW TARGET'}`,
    );
  }
  return ok;
}

/** A hundred log entries at once from six apprentices, while someone keeps asking /api/health. */
async function measureBurst(cookies: string[]) {
  const healthTimes: number[] = [];
  let bursting = true;
  const watch = (async () => {
    while (bursting) {
      const started = performance.now();
      await fetch(`${base(APP_PORT)}/api/health`);
      healthTimes.push(performance.now() - started);
    }
  })();
  const started = performance.now();
  const statuses = await Promise.all(
    Array.from({ length: BURST }, (_, i) =>
      fetch(`${base(APP_PORT)}/api/log-entries`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', origin: base(APP_PORT), cookie: cookies[i % cookies.length] },
        body: JSON.stringify({
          date: new Date().toISOString().slice(0, 10),
          minutes: 30,
          title: `Burst entry ${i + 1}`,
          notes: 'Measured the pivots again.',
          measurements: [{ name: 'side shake', value: 0.03, unit: 'mm' }],
        }),
      }).then((r) => r.status),
    ),
  );
  const seconds = (performance.now() - started) / 1000;
  bursting = false;
  await watch;
  const sorted = healthTimes.sort((a, b) => a - b);
  const p99 = sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * 0.99))];
  const created = statuses.filter((s) => s === 201).length;
  const pass = created === BURST && p99 <= HEALTH_P99_MS;
  console.log(
    `  write burst: ${created}/${BURST} log entries created in ${seconds.toFixed(1)} s; /api/health p99 ${p99.toFixed(0)} ms ` +
      `over ${sorted.length} calls (target ${HEALTH_P99_MS} ms)  ${pass ? 'OK' : 'BELOW TARGET'}`,
  );
  return pass;
}

async function measureMixed(cookies: { apprentice: string; mentor: string }) {
  const as = (cookie: string, route: string) => ({ method: 'GET' as const, path: route, headers: { cookie } });
  const f = await load(base(APP_PORT), {
    connections: MIXED_CONNECTIONS,
    duration: MIXED_SECONDS,
    requests: [
      as(cookies.apprentice, '/api/auth/me'),
      as(cookies.apprentice, '/api/courses'),
      as(cookies.apprentice, LESSON),
      as(cookies.apprentice, '/api/log-entries'),
      as(cookies.apprentice, '/api/submissions'),
      as(cookies.mentor, '/api/review-queue'),
    ],
  });
  const pass = f.errors === 0 && f.p99 <= MIXED_P99_MS;
  console.log(
    `  ${MIXED_CONNECTIONS} connections of mixed reads for ${MIXED_SECONDS} s: ${f.rps.toFixed(0)} req/s, p99 ${f.p99} ms ` +
      `(target ${MIXED_P99_MS} ms), errors ${f.errors}  ${pass ? 'OK' : 'BELOW TARGET'}`,
  );
  return pass;
}

export async function runApiBench(): Promise<boolean> {
  const dataDir = mkdtempSync(path.join(tmpdir(), 'tickwright-bench-api-'));
  const children: ChildProcess[] = [];
  try {
    children.push(
      await start(
        'server/index.ts',
        {
          NODE_ENV: 'production',
          PORT: String(APP_PORT),
          APP_URL: base(APP_PORT),
          DATA_DIR: dataDir,
          LOG_LEVEL: 'warn',
          DEV_SMTP_PORT: '4425',
          DEV_MAIL_WEB_PORT: '4480',
        },
        (line) => line.includes('is running at'),
      ),
      await start('tests/bench/bare-express.ts', { PORT: String(BARE_PORT) }, (line) => line.includes('ready')),
    );
    const cookies = { apprentice: await signIn('ned'), mentor: await signIn('odile') };
    const writers = await Promise.all(['ned', 'ruth', 'tamsin', 'jago', 'wren', 'elias'].map(signIn));

    console.log(`API under load, ${CONNECTIONS} connections, ${SECONDS} s each after a 3 s warm-up ${machine()}:`);
    await load(`${base(BARE_PORT)}/bare`, { duration: 3 });
    const bare = await load(`${base(BARE_PORT)}/bare`);
    console.log(`  bare Express       ${bare.rps.toFixed(0).padStart(6)} req/s  p99 ${bare.p99} ms`);
    const results = [await measureReads(cookies, bare.rps), await measureBurst(writers), await measureMixed(cookies)];
    return results.every(Boolean);
  } finally {
    for (const child of children) child.kill('SIGTERM');
    rmSync(dataDir, { recursive: true, force: true });
  }
}

const machine = () => `(load ${loadavg()[0].toFixed(1)} on ${availableParallelism()} cores)`;

if (import.meta.url === `file://${process.argv[1]}`) process.exitCode = (await runApiBench()) ? 0 : 1;
