import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// vite does not read tsconfig `paths`, so the workspace libraries get the same aliases here.
const alias = {
  '@tallus/chem': fileURLToPath(new URL('./libs/chem/src/index.ts', import.meta.url)),
  '@tallus/contracts': fileURLToPath(new URL('./libs/contracts/src/index.ts', import.meta.url)),
};

/** Every Node-side test suite. The Angular client's unit tests run through `ng test` instead. */
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: {
          name: 'chem',
          include: ['libs/chem/**/*.spec.ts'],
          environment: 'node',
          // The property suites run thousands of cases; on a loaded 2-core machine 5 s is too tight.
          testTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: { name: 'architecture', include: ['test/architecture/**/*.spec.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        test: { name: 'contracts', include: ['libs/contracts/**/*.spec.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        test: { name: 'api-unit', include: ['apps/api/**/*.spec.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        test: {
          name: 'api',
          include: ['test/api/**/*.spec.ts'],
          environment: 'node',
          globalSetup: ['test/api/global-setup.ts'],
          fileParallelism: false,
          testTimeout: 20_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'browser',
          include: ['test/browser/**/*.spec.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 60_000,
          hookTimeout: 180_000,
        },
      },
    ],
  },
});
