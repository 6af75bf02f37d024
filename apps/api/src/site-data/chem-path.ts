import { isChemError } from '@tallus/chem';
import { ChemInputError } from '../errors/app-errors';

/**
 * The request path of an engine error's `details.field` (`solutes.Ca.unit` →
 * `['solutes', 'Ca', 'unit']`, `phases.2.equation` → `['phases', 2, 'equation']`),
 * under `prefix`.
 */
export function fieldPath(field: unknown, prefix: ReadonlyArray<string | number> = []): Array<string | number> {
  const parts = typeof field === 'string' && field !== '' ? field.split('.').map((part) => (/^\d+$/.test(part) ? Number(part) : part)) : [];
  return [...prefix, ...parts];
}

/**
 * Runs engine code on request input: a `ChemError` becomes a `ChemInputError`
 * at the request path its `details.field` names (422 with the path and span).
 *
 * @param prefix path of the engine's input inside the request body, e.g. `['analysis']`
 * @throws ChemInputError for chemistry errors; anything else propagates
 */
export function withChemPath<T>(prefix: ReadonlyArray<string | number>, run: () => T): T {
  try {
    return run();
  } catch (error) {
    // Only the engine's input errors are the caller's fault; a plain Error is a bug and stays a 500.
    if (isChemError(error)) throw new ChemInputError(fieldPath(error.details.field, prefix), error);
    throw error;
  }
}
