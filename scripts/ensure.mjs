// Installs what the two commands need when it is missing: npm packages, PostgreSQL, Chromium.
// Only Node built-ins here: this runs before node_modules exists.
import { spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { join } from 'node:path';

/** Root folder of the repository. */
export const ROOT = new URL('..', import.meta.url).pathname.replace(/\/$/, '');

/**
 * Runs a command with inherited output and fails loudly when it fails.
 * @param {string} command
 * @param {string[]} args
 * @param {{env?: NodeJS.ProcessEnv, quiet?: boolean}} [options]
 */
export function run(command, args, options = {}) {
  const result = spawnSync(command, args, {
    cwd: ROOT,
    stdio: options.quiet ? ['ignore', 'pipe', 'pipe'] : 'inherit',
    env: options.env ?? process.env,
    encoding: 'utf8',
  });
  if (result.status !== 0) {
    if (options.quiet) process.stderr.write(`${result.stdout ?? ''}${result.stderr ?? ''}`);
    throw new Error(`${command} ${args.join(' ')} failed with exit code ${result.status ?? result.signal}`);
  }
  return result;
}

/** Whether npm's record of installed packages is older than package-lock.json (or absent). */
function arePackagesStale() {
  const installed = join(ROOT, 'node_modules', '.package-lock.json');
  if (!existsSync(installed)) return true;
  const lock = join(ROOT, 'package-lock.json');
  return statSync(lock).mtimeMs > statSync(installed).mtimeMs;
}

/** Installs npm packages from the lock file when they are missing or stale. */
export function ensurePackages() {
  if (!arePackagesStale()) return;
  const fresh = !existsSync(join(ROOT, 'node_modules'));
  console.log(fresh ? 'Installing npm packages (first run)...' : 'Updating npm packages...');
  run('npm', [fresh ? 'ci' : 'install', '--no-audit', '--no-fund', '--loglevel=error']);
}

/** Installs PostgreSQL from Debian's packages when no server binaries are present. */
export function ensurePostgres() {
  run('bash', [join(ROOT, 'docker-less-db', 'install.sh')]);
}

/** Path of the Chromium the browser tests drive, installing Debian's package when missing. */
export function ensureChromium() {
  const candidates = [process.env.CHROMIUM_PATH, '/usr/bin/chromium', '/usr/bin/chromium-browser'].filter(Boolean);
  const found = candidates.find((path) => existsSync(path));
  if (found) return found;
  if (process.getuid?.() !== 0) throw new Error('Chromium is missing: install Debian\'s "chromium" package.');
  console.log("Installing Debian's chromium for the browser tests...");
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  run('apt-get', ['update', '-qq'], { env, quiet: true });
  run('apt-get', ['install', '-y', '-qq', '--no-install-recommends', 'chromium'], { env, quiet: true });
  return '/usr/bin/chromium';
}
