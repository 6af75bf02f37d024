/**
 * Process entry of the command line: `npm run --silent chem -- <command> ... [--json]`.
 */
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { run } from './run';

export { run } from './run';
export type { CliIo } from './run';

const isEntry = process.argv[1] !== undefined && import.meta.url === pathToFileURL(process.argv[1]).href;

if (isEntry) {
  process.exitCode = run(process.argv.slice(2), {
    stdout: (text) => process.stdout.write(text),
    stderr: (text) => process.stderr.write(text),
    readFile: (path) => readFileSync(path, 'utf8'),
  });
}
