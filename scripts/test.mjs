// `npm test`: install what is missing, start a throwaway PostgreSQL in a temporary folder, build the
// client, type-check the rest, run every suite (libs, API on the real database, client unit tests, browser journeys),
// remove the cluster, and end with one line "N passed, N failed".
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ROOT, ensureChromium, ensurePackages, ensurePostgres, run } from './ensure.mjs';

const reports = join(ROOT, '.tmp', 'test-reports');
const dataDir = mkdtempSync(join(tmpdir(), 'tallus-test-db-'));
const db = {
  TALLUS_DB_DATA: join(dataDir, 'pgdata'),
  TALLUS_DB_HOST: '127.0.0.1',
  TALLUS_DB_PORT: process.env.TALLUS_TEST_DB_PORT ?? '54329',
  TALLUS_DB_NAME: 'tallus_test',
  TALLUS_DB_USER: 'tallus',
  TALLUS_DB_PASSWORD: 'tallus-test-only',
  TALLUS_DB_MODE: 'throwaway',
};

/** Runs one suite, never throwing: a failing suite still lets the others run and be counted. */
function runSuite(name, command, args, env) {
  console.log(`\n=== ${name} ===`);
  const result = spawnSync(command, args, { cwd: ROOT, stdio: 'inherit', env });
  return result.status === 0;
}

/** Totals from a vitest JSON report; a missing report counts as one failure. */
function readTotals(file) {
  if (!existsSync(file)) return { passed: 0, failed: 1, missing: true };
  const report = JSON.parse(readFileSync(file, 'utf8'));
  const failedTests = report.numFailedTests ?? 0;
  // A file that fails to load has no failed tests of its own: count it once, so it cannot pass silently.
  const brokenFiles = failedTests === 0 ? (report.numFailedTestSuites ?? 0) : 0;
  return { passed: report.numPassedTests ?? 0, failed: failedTests + brokenFiles };
}

function main() {
  ensurePackages();
  ensurePostgres();
  const chromium = ensureChromium();
  rmSync(reports, { recursive: true, force: true });
  mkdirSync(reports, { recursive: true });
  run('bash', [join(ROOT, 'docker-less-db', 'start.sh')], { env: { ...process.env, ...db } });

  const env = { ...process.env, ...db, NODE_ENV: 'test', CI: process.env.CI ?? 'true', CHROMIUM_PATH: chromium, NG_CLI_ANALYTICS: 'false' };
  const outcomes = [];
  const built = runSuite('client build', 'npx', ['ng', 'build', 'web', '--configuration', 'production'], env);
  if (!built) outcomes.push({ passed: 0, failed: 1 });
  // vitest strips types without checking them; the client build checks the client's.
  const typed = runSuite('typecheck (libs, API, tests, benchmarks)', 'npx', ['tsc', '-p', 'tsconfig.json', '--noEmit'], env);
  if (!typed) outcomes.push({ passed: 0, failed: 1 });

  // The browser journeys run on their own afterwards: they drive a real server and Chromium, and
  // sharing two cores with the API suites makes their waits flaky.
  const nodeProjects = ['architecture', 'chem', 'contracts', 'api-unit', 'api'];
  const nodeReport = join(reports, 'node-suites.json');
  runSuite('libs and API suites', 'npx', ['vitest', 'run', ...nodeProjects.map((name) => `--project=${name}`), '--reporter=default', '--reporter=json', `--outputFile.json=${nodeReport}`], env);
  outcomes.push(readTotals(nodeReport));

  const browserReport = join(reports, 'browser.json');
  runSuite('browser journeys', 'npx', ['vitest', 'run', '--project=browser', '--reporter=default', '--reporter=json', `--outputFile.json=${browserReport}`], env);
  outcomes.push(readTotals(browserReport));

  const webReport = join(reports, 'web.json');
  runSuite('client unit tests', 'npx', ['ng', 'test', 'web', '--watch=false', '--reporters=json', `--output-file=${webReport}`, '--reporters=default'], env);
  outcomes.push(readTotals(webReport));
  return outcomes;
}

let outcomes = [];
let exitCode = 1;
try {
  outcomes = main();
} catch (error) {
  console.error(`npm test could not run: ${error instanceof Error ? error.message : String(error)}`);
  outcomes.push({ passed: 0, failed: 1 });
} finally {
  spawnSync('bash', [join(ROOT, 'docker-less-db', 'stop.sh')], { cwd: ROOT, env: { ...process.env, ...db }, stdio: 'ignore' });
  rmSync(dataDir, { recursive: true, force: true });
}
const passed = outcomes.reduce((sum, outcome) => sum + outcome.passed, 0);
const failed = outcomes.reduce((sum, outcome) => sum + outcome.failed, 0);
exitCode = failed === 0 && passed > 0 ? 0 : 1;
console.log(`${passed} passed, ${failed} failed`);
process.exit(exitCode);
