// Bundles the API (apps/api/src/main.ts) into dist/api/main.mjs for production:
// `npm run build:api`, then `node dist/api/main.mjs`. npm packages stay external
// (loaded from node_modules at run time); the workspace libraries, which ship as
// TypeScript sources, are bundled in through aliases.
import { build } from 'esbuild';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));

await build({
  entryPoints: [`${root}apps/api/src/main.ts`],
  outfile: `${root}dist/api/main.mjs`,
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  packages: 'external',
  alias: {
    '@tallus/chem': `${root}libs/chem/src/index.ts`,
    '@tallus/contracts': `${root}libs/contracts/src/index.ts`,
  },
  sourcemap: true,
  logLevel: 'warning',
});
console.log('API bundled to dist/api/main.mjs');
