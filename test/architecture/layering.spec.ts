import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

// The house rules of DEVELOPERS.md and STYLE.md, checked on every run: dependencies point one way
// (chem ← contracts ← api, web), the apps never import each other, and no source file grows past
// the 400-line limit.
const root = fileURLToPath(new URL('../..', import.meta.url));

function sourceFiles(folder: string): string[] {
  const found: string[] = [];
  const visit = (path: string) => {
    for (const entry of readdirSync(path)) {
      if (entry === 'node_modules' || entry === 'dist') continue;
      const full = join(path, entry);
      if (statSync(full).isDirectory()) visit(full);
      else if (/\.ts$/.test(entry) && !entry.endsWith('.d.ts')) found.push(full);
    }
  };
  visit(join(root, folder));
  return found;
}

function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  return [...text.matchAll(/(?:^|\n)\s*(?:import|export)[^'"]*?from\s+['"]([^'"]+)['"]/g)].map((match) => match[1]);
}

/** Every import of the files in `folder` that `isForbidden` refuses, as "file: specifier". */
function forbiddenImports(folder: string, isForbidden: (specifier: string, file: string) => boolean): string[] {
  // Specs may import their test tools and reference libraries; the rules are about shipped code.
  return sourceFiles(folder).filter((file) => !file.endsWith('.spec.ts')).flatMap((file) =>
    importsOf(file)
      .filter((specifier) => isForbidden(specifier, file))
      .map((specifier) => `${relative(root, file)}: ${specifier}`),
  );
}

const reachesInto = (specifier: string, folder: string) => specifier.includes(`${folder}/`) || specifier.startsWith(`@tallus/${folder.split('/')[1]}/`);

describe('Dependency direction', () => {
  it('When the engine is read, then it imports no app, no framework and no other library', () => {
    const allowedPackages = new Set<string>();
    const offenders = forbiddenImports('libs/chem/src', (specifier) =>
      !specifier.startsWith('.') && !specifier.startsWith('node:') ? !allowedPackages.has(specifier) : reachesInto(specifier, 'apps'),
    );
    expect(offenders).toEqual([]);
  });

  it('When the engine is read, then it does no I/O (no node: modules)', () => {
    expect(forbiddenImports('libs/chem/src', (specifier) => specifier.startsWith('node:'))).toEqual([]);
  });

  it('When the contracts are read, then they import only zod and the engine', () => {
    const offenders = forbiddenImports('libs/contracts/src', (specifier) =>
      !specifier.startsWith('.') && !['zod', '@tallus/chem'].includes(specifier),
    );
    expect(offenders).toEqual([]);
  });

  it('When the apps are read, then neither imports the other, and both use the libraries only through their entry', () => {
    const web = forbiddenImports('apps/web/src', (specifier) => specifier.includes('apps/api') || /^@tallus\/\w+\/.+/.test(specifier) || specifier.includes('libs/'));
    const api = forbiddenImports('apps/api/src', (specifier) => specifier.includes('apps/web') || /^@tallus\/\w+\/.+/.test(specifier) || specifier.includes('libs/'));
    expect([...web, ...api]).toEqual([]);
  });
});

describe('File size', () => {
  it('When any source file is read, then it stays within the 400-line limit', () => {
    const folders = ['libs/chem/src', 'libs/chem/cli', 'libs/contracts/src', 'apps/api/src', 'apps/web/src'];
    const tooLong = folders
      .flatMap(sourceFiles)
      .filter((file) => !file.includes('/migrations/'))
      .map((file) => ({ file: relative(root, file), lines: readFileSync(file, 'utf8').split('\n').length }))
      .filter(({ lines }) => lines > 400);
    expect(tooLong).toEqual([]);
  });
});
