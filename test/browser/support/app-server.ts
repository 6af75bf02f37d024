import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../..', import.meta.url));

/** A running Tallus server (API and built client) for one browser suite. */
export interface AppServer {
  readonly baseUrl: string;
  stop(): Promise<void>;
}

/** A free loopback port, asked of the operating system. */
function findFreePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

async function waitForHealth(baseUrl: string, child: ChildProcess, log: () => string): Promise<void> {
  const deadline = Date.now() + 90_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The server exited early:\n${log()}`);
    try {
      const response = await fetch(`${baseUrl}/api/health`);
      if (response.ok) return;
    } catch {
      // Not listening yet.
    }
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  throw new Error(`The server did not become healthy:\n${log()}`);
}

/** Options of {@link startAppServer}. */
export interface AppServerOptions {
  /** Whether to load the invented demo teams and accounts (TALLUS_SEED_DEMO=1), as `npm start` does. */
  isDemoSeeded?: boolean;
}

/**
 * Starts the real server (migrations, fake SMTP, built client) on a free port against the test database
 * that `npm test` provides through the TALLUS_DB_* variables.
 */
export async function startAppServer(options: AppServerOptions = {}): Promise<AppServer> {
  const webDist = `${root}dist/web/browser`;
  if (!existsSync(`${webDist}/index.html`)) throw new Error('Build the client first: npx ng build web');
  const port = await findFreePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  let output = '';
  const child = spawn(`${root}node_modules/.bin/tsx`, ['apps/api/src/main.ts'], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      PORT: String(port),
      HOST: '127.0.0.1',
      WEB_DIST: webDist,
      PUBLIC_ORIGIN: baseUrl,
      // The lowest cost the API accepts: journeys register and sign in often, and hashing at the
      // production cost on a loaded machine made those steps slow enough to time out.
      BCRYPT_COST: '10',
      ...(options.isDemoSeeded ? { TALLUS_SEED_DEMO: '1' } : {}),
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (chunk) => (output += String(chunk)));
  child.stderr?.on('data', (chunk) => (output += String(chunk)));
  await waitForHealth(baseUrl, child, () => output);
  return {
    baseUrl,
    stop: () =>
      new Promise((resolve) => {
        if (child.exitCode !== null) return resolve();
        child.once('exit', () => resolve());
        child.kill('SIGTERM');
      }),
  };
}
