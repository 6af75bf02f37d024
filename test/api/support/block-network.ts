import net from 'node:net';

const LOOPBACK_HOSTS = new Set(['127.0.0.1', '::1', 'localhost', '::ffff:127.0.0.1']);

/** The host a `socket.connect(...)` call aims at; undefined for a unix socket path. */
function targetHost(args: unknown[]): string | undefined {
  const [first, second] = args;
  if (typeof first === 'object' && first !== null && !Array.isArray(first)) {
    const options = first as { host?: string; path?: string };
    return options.path ? undefined : (options.host ?? 'localhost');
  }
  if (Array.isArray(first)) return targetHost(first);
  if (typeof first === 'string' && Number.isNaN(Number(first))) return undefined;
  return typeof second === 'string' ? second : 'localhost';
}

let isBlocked = false;

/**
 * Makes every TCP connection to a host other than loopback fail at once, so a
 * test that would reach the internet (a mail relay, an API) fails loudly
 * instead. PostgreSQL, the fake SMTP server and supertest all stay on loopback.
 */
export function blockOutgoingNetwork(): void {
  if (isBlocked) return;
  isBlocked = true;
  const connect = net.Socket.prototype.connect;
  net.Socket.prototype.connect = function guardedConnect(this: net.Socket, ...args: unknown[]) {
    const host = targetHost(args);
    if (host !== undefined && !LOOPBACK_HOSTS.has(host)) {
      throw new Error(`Outgoing network is blocked in API tests (tried ${host})`);
    }
    return (connect as (...params: unknown[]) => net.Socket).apply(this, args);
  } as typeof connect;
}
