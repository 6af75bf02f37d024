/**
 * `npm run bench:api`: requests per second and p95 latency of the API on loopback for
 *   1. GET /api/reaction-sets/:id of a set of 500 reactions (stored results, targets p95 < 100 ms),
 *   2. POST /api/chem/balance (target ≥ 1,000 requests per second).
 *
 * By default it starts the API (apps/api/src/main.ts) as a child process on a free loopback
 * port, so the load generator does not share the server's event loop, against the database
 * `tallus_bench` (created when missing; main.ts migrates it), with the computation rate limit off
 * (CHEM_RATE_LIMIT_PER_MINUTE=0). With BENCH_API_URL=http://host:port it benchmarks a
 * server that is already running instead (start it with CHEM_RATE_LIMIT_PER_MINUTE=0, or the
 * balance figures measure the 429s). Either way it registers a fresh user, creates a team and
 * imports the 500-reaction set through the API.
 *
 * autocannon reports p97.5 and p99 but not p95, so every response time is recorded
 * (autocannon's `response` event) and p95 is read from the sorted times. Prints a table and one
 * JSON line. The GET runs twice: with one connection (one user opening the set: the latency
 * target) and with BENCH_CONNECTIONS (queueing included). Settings: BENCH_DURATION seconds per
 * run (10), BENCH_CONNECTIONS (10), BENCH_NODE_ARGS (node flags for the API child, such as
 * `--cpu-prof --cpu-prof-dir=.tmp/prof`).
 */
import { spawn } from 'node:child_process';
import { createRequire } from 'node:module';
import { createServer, type AddressInfo } from 'node:net';
import { MikroORM } from '@mikro-orm/postgresql';
import { loadConfig } from '../../apps/api/src/config/env';
import { createOrmOptions } from '../../apps/api/src/db/mikro-orm.config';
import { benchSetFile } from './bench-set';

/** The parts of autocannon 9 used here (the package ships no types). */
interface AutocannonOptions {
  url: string;
  method?: 'GET' | 'POST';
  headers?: Record<string, string>;
  body?: string;
  connections?: number;
  duration?: number;
}
interface AutocannonResult {
  requests: { total: number };
  non2xx: number;
  duration: number;
}
interface AutocannonInstance extends PromiseLike<AutocannonResult> {
  on(event: 'response', listener: (client: unknown, status: number, bytes: number, responseTime: number) => void): void;
}
const autocannon = createRequire(import.meta.url)('autocannon') as (options: AutocannonOptions) => AutocannonInstance;

const DURATION = Number(process.env['BENCH_DURATION'] ?? 10);
const CONNECTIONS = Number(process.env['BENCH_CONNECTIONS'] ?? 10);
const REACTIONS = 500;

interface Figures {
  name: string;
  requests: number;
  non2xx: number;
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
}

/** Creates the benchmark's database when missing, through the maintenance database `postgres`. */
async function ensureDatabase(name: string): Promise<void> {
  const config = loadConfig({ ...process.env, TALLUS_DB_NAME: 'postgres' });
  const orm = await MikroORM.init(createOrmOptions(config));
  const found = await orm.em.execute<Array<{ exists: boolean }>>('select 1 as exists from pg_database where datname = ?', [name]);
  if (found.length === 0) await orm.em.execute(`create database "${name.replaceAll('"', '')}"`);
  await orm.close();
}

/**
 * Starts the API (apps/api/src/main.ts under tsx) as a child process on a free loopback port,
 * so that autocannon and the server do not share one event loop; returns its URL and a stop function.
 */
async function startServer(): Promise<{ url: string; stop: () => Promise<void> }> {
  const database = process.env['TALLUS_DB_NAME'] ?? 'tallus_bench';
  await ensureDatabase(database);
  const port = await freePort();
  const child = spawn(process.execPath, [...(process.env['BENCH_NODE_ARGS']?.split(' ').filter(Boolean) ?? []), '--import', 'tsx', 'apps/api/src/main.ts'], {
    env: { ...process.env, TALLUS_DB_NAME: database, NODE_ENV: 'development', LOG_LEVEL: 'warn', BCRYPT_COST: '10', CHEM_RATE_LIMIT_PER_MINUTE: '0', PORT: String(port), HOST: '127.0.0.1', WEB_DIST: 'bench/api/no-client', TALLUS_SEED_DEMO: '0' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  await new Promise<void>((resolve, reject) => {
    child.once('exit', (code) => reject(new Error(`The API exited with code ${code} before listening`)));
    child.stdout!.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('listening on')) resolve();
    });
  });
  return {
    url: `http://127.0.0.1:${port}`,
    async stop() {
      const exited = new Promise((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      await exited;
    },
  };
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as AddressInfo;
      probe.close(() => resolve(port));
    });
  });
}

async function api<T>(url: string, path: string, init: RequestInit & { token?: string } = {}): Promise<T> {
  const headers = new Headers(init.headers);
  if (init.token) headers.set('Authorization', `Bearer ${init.token}`);
  if (typeof init.body === 'string') headers.set('Content-Type', 'application/json');
  const response = await fetch(`${url}${path}`, { ...init, headers });
  if (!response.ok) throw new Error(`${init.method ?? 'GET'} ${path}: ${response.status} ${await response.text()}`);
  return (await response.json()) as T;
}

/** Registers a user, creates a team, imports the 500-reaction set; returns the token and the set id. */
async function arrange(url: string): Promise<{ token: string; setId: string }> {
  const email = `bench-${Date.now().toString(36)}@bench.example`;
  const { token } = await api<{ token: string }>(url, '/api/auth/register', { method: 'POST', body: JSON.stringify({ email, password: 'bench-password-2026', displayName: 'Bench' }) });
  const team = await api<{ id: string }>(url, '/api/teams', { method: 'POST', token, body: JSON.stringify({ name: 'Bench team' }) });
  const form = new FormData();
  form.append('file', new Blob([JSON.stringify(benchSetFile(REACTIONS))], { type: 'application/json' }), 'bench.json');
  const started = performance.now();
  const set = await api<{ id: string; reactionCount: number }>(url, `/api/teams/${team.id}/reaction-sets/import`, { method: 'POST', token, body: form });
  console.log(`Imported ${set.reactionCount} reactions (each checked by libs/chem) in ${Math.round(performance.now() - started)} ms.`);
  return { token, setId: set.id };
}

function percentile(sorted: number[], fraction: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.ceil(fraction * sorted.length) - 1)]!;
}

async function measure(name: string, options: AutocannonOptions): Promise<Figures> {
  const times: number[] = [];
  const instance = autocannon({ connections: CONNECTIONS, duration: DURATION, ...options });
  instance.on('response', (_client, _status, _bytes, responseTime) => times.push(responseTime));
  const result = await instance;
  times.sort((a, b) => a - b);
  const round = (value: number) => Math.round(value * 10) / 10;
  return {
    name,
    requests: result.requests.total,
    non2xx: result.non2xx,
    requestsPerSecond: round(result.requests.total / (result.duration || DURATION)),
    p50Ms: round(percentile(times, 0.5)),
    p95Ms: round(percentile(times, 0.95)),
    p99Ms: round(percentile(times, 0.99)),
  };
}

const external = process.env['BENCH_API_URL'];
const server = external ? { url: external.replace(/\/+$/, ''), stop: async () => undefined } : await startServer();
try {
  const { token, setId } = await arrange(server.url);
  const headers = { authorization: `Bearer ${token}`, 'content-type': 'application/json' };
  const getSetAlone = await measure(`GET /api/reaction-sets/:id (${REACTIONS} reactions), 1 connection`, { url: `${server.url}/api/reaction-sets/${setId}`, headers, connections: 1 });
  const getSet = await measure(`GET /api/reaction-sets/:id (${REACTIONS} reactions), ${CONNECTIONS} connections`, { url: `${server.url}/api/reaction-sets/${setId}`, headers });
  const balance = await measure('POST /api/chem/balance', {
    url: `${server.url}/api/chem/balance`,
    method: 'POST',
    headers,
    body: JSON.stringify({ equation: 'FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', normalizeTo: 'FeS2' }),
  });
  console.log(`\n${CONNECTIONS} connections, ${DURATION} s each, ${external ? external : 'API child process'} on loopback`);
  console.table([getSetAlone, getSet, balance]);
  console.log(
    JSON.stringify({
      bench: 'api',
      getSetAloneP95Ms: getSetAlone.p95Ms,
      getSetAloneRps: getSetAlone.requestsPerSecond,
      getSetP95Ms: getSet.p95Ms,
      getSetRps: getSet.requestsPerSecond,
      balanceRps: balance.requestsPerSecond,
      balanceP95Ms: balance.p95Ms,
      targets: { getSetP95Under100MsOneConnection: getSetAlone.p95Ms < 100, getSetP95Under100Ms: getSet.p95Ms < 100, balanceAtLeast1000Rps: balance.requestsPerSecond >= 1000 },
      non2xx: getSetAlone.non2xx + getSet.non2xx + balance.non2xx,
    }),
  );
} finally {
  await server.stop();
}
