/**
 * The environment API tests run with: the TALLUS_DB_* variables that `npm test`
 * sets (database `tallus_test` by default, never the development one), test
 * mode, silent logs, the cheapest allowed bcrypt cost, a fixed public origin,
 * and no built client.
 *
 * @param overrides variables to set on top, e.g. a low AUTH_RATE_LIMIT_MAX
 */
export function testEnvironment(overrides: Record<string, string> = {}): NodeJS.ProcessEnv {
  return {
    TALLUS_DB_HOST: process.env['TALLUS_DB_HOST'],
    TALLUS_DB_PORT: process.env['TALLUS_DB_PORT'],
    TALLUS_DB_NAME: process.env['TALLUS_DB_NAME'] ?? 'tallus_test',
    TALLUS_DB_USER: process.env['TALLUS_DB_USER'],
    TALLUS_DB_PASSWORD: process.env['TALLUS_DB_PASSWORD'],
    NODE_ENV: 'test',
    LOG_LEVEL: 'silent',
    BCRYPT_COST: '10',
    PUBLIC_ORIGIN: 'http://tallus.test:4300',
    WEB_DIST: 'test/api/no-client-here',
    ...overrides,
  };
}
