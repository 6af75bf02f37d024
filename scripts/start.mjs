// `npm start`: install what is missing, start PostgreSQL on loopback, build the client when its
// sources changed, then run the API (migrations and idempotent demo data included) and serve the app.
import { spawn } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT, ensurePackages, ensurePostgres, run } from './ensure.mjs';

const port = process.env.PORT ?? '4300';
const host = process.env.HOST ?? '127.0.0.1';

/** Newest modification time of any file below the given paths. */
function newestChange(paths) {
  let newest = 0;
  const visit = (path) => {
    if (!existsSync(path)) return;
    const stat = statSync(path);
    if (stat.isDirectory()) {
      for (const entry of readdirSync(path)) if (entry !== 'node_modules') visit(join(path, entry));
    } else newest = Math.max(newest, stat.mtimeMs);
  };
  paths.forEach((path) => visit(join(ROOT, path)));
  return newest;
}

function buildClientWhenStale() {
  const index = join(ROOT, 'dist', 'web', 'browser', 'index.html');
  const sources = ['apps/web', 'libs/chem/src', 'libs/contracts/src', 'fonts', 'angular.json', 'package-lock.json'];
  if (existsSync(index) && statSync(index).mtimeMs > newestChange(sources)) {
    console.log('Client is up to date.');
    return;
  }
  console.log('Building the client...');
  run('npx', ['ng', 'build', 'web', '--configuration', 'production'], {
    env: { ...process.env, NG_CLI_ANALYTICS: 'false' },
  });
}

function stopDatabase() {
  try {
    run('bash', [join(ROOT, 'docker-less-db', 'stop.sh')]);
  } catch (error) {
    console.error(String(error));
  }
}

function printSignIns() {
  const script = [
    "import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './apps/api/src/db/seeders/demo-accounts';",
    "console.log('Demo sign-ins (invented people; password for all: ' + DEMO_PASSWORD + '):');",
    "for (const a of DEMO_ACCOUNTS) console.log('  ' + a.team.padEnd(15) + a.role.padEnd(9) + a.email);",
  ].join('\n');
  spawn(join(ROOT, 'node_modules', '.bin', 'tsx'), ['--eval', script], { cwd: ROOT, stdio: 'inherit' });
}

function serve() {
  const env = {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV ?? 'development',
    PORT: port,
    HOST: host,
    TALLUS_SEED_DEMO: process.env.TALLUS_SEED_DEMO ?? '1',
    WEB_DIST: join(ROOT, 'dist', 'web', 'browser'),
  };
  const server = spawn(join(ROOT, 'node_modules', '.bin', 'tsx'), ['apps/api/src/main.ts'], { cwd: ROOT, env, stdio: ['ignore', 'pipe', 'inherit'] });
  let announced = false;
  server.stdout.on('data', (chunk) => {
    process.stdout.write(chunk);
    if (!announced && /listening/i.test(String(chunk))) {
      announced = true;
      console.log(`\nTallus is ready: http://${host}:${port}\n`);
      printSignIns();
    }
  });
  let stopping = false;
  const shutdown = (signal) => {
    if (stopping) return;
    stopping = true;
    console.log(`\nStopping Tallus (${signal})...`);
    server.kill('SIGTERM');
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
  server.on('exit', (code) => {
    stopDatabase();
    process.exit(stopping ? 0 : (code ?? 1));
  });
}

try {
  ensurePackages();
  ensurePostgres();
  run('bash', [join(ROOT, 'docker-less-db', 'start.sh')]);
  buildClientWhenStale();
  serve();
} catch (error) {
  console.error(`npm start failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
}
