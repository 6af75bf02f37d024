/**
 * The linear problem behind a net reaction: each reaction's net change of every species
 * (right minus left), the rows of the species to cancel, and the fixed multipliers.
 *
 * Species identity: composition and charge. The phase tag separates two species only where the
 * same composition is written with two different tags in the problem (CO2(g) and CO2(aq));
 * an untagged cancel formula then cancels every phase of it.
 */
import { checkEquation } from '../check/check-equation';
import { ChemError, isChemError } from '../errors/chem-error';
import type { ChemWarning } from '../errors/chem-warning';
import type { Equation } from '../equation/equation';
import type { Formula } from '../formula/formula';
import { parseEquation } from '../equation/parse-equation';
import { parseFormula } from '../formula/parse-formula';
import { phasedSpeciesKey, speciesKey } from '../formula/species-key';
import { Rational } from '../rational/rational';

/** The combination problem in exact numbers. */
export interface CombineProblem {
  /** One formula per distinct species, as first written. */
  readonly species: readonly Formula[];
  /** `net[reaction][species]`: right minus left. */
  readonly net: readonly (readonly Rational[])[];
  /** One row per species to cancel: its net change in each reaction. */
  readonly cancelRows: readonly (readonly Rational[])[];
  readonly pins: ReadonlyMap<number, Rational>;
  readonly warnings: readonly ChemWarning[];
}

function parseReaction(input: string | Equation, reaction: number): Equation {
  if (typeof input !== 'string') return input;
  try {
    return parseEquation(input);
  } catch (error) {
    if (!isChemError(error)) throw error;
    throw new ChemError(error.code, error.message, error.span, { ...error.details, reaction });
  }
}

function keyFunction(equations: readonly Equation[]): (formula: Formula) => string {
  const phases = new Map<string, Set<string>>();
  for (const term of equations.flatMap((equation) => equation.terms)) {
    const key = speciesKey(term.formula);
    const seen = phases.get(key) ?? new Set<string>();
    if (term.formula.phase !== null) seen.add(term.formula.phase);
    phases.set(key, seen);
  }
  return (formula) => ((phases.get(speciesKey(formula))?.size ?? 0) > 1 ? phasedSpeciesKey(formula) : speciesKey(formula));
}

function readMultiplier(value: Rational | number | string, reaction: number): Rational {
  const parsed = Rational.tryFrom(value);
  if (parsed !== null) return parsed;
  throw new ChemError('COMBINE_BAD_MULTIPLIER', 'A multiplier is a number such as 2, -1, 0.5 or 15/4.', { start: 0, end: String(value).length }, { reaction });
}

function cancelColumns(cancel: readonly string[], keys: readonly string[], keyOf: (formula: Formula) => string): number[][] {
  return cancel.map((text, index) => {
    const formula = parseFormula(text);
    const wanted = formula.phase === null ? speciesKey(formula) : keyOf(formula);
    const columns = keys.flatMap((key, column) => (key === wanted || key.startsWith(`${wanted}|`) ? [column] : []));
    if (columns.length > 0) return columns;
    throw new ChemError('COMBINE_UNKNOWN_SPECIES', `${text.trim()} appears in none of the reactions.`, { start: 0, end: text.length }, { cancel: index });
  });
}

/**
 * Builds the problem.
 * @throws ChemError COMBINE_NO_REACTIONS, COMBINE_UNKNOWN_SPECIES (details.cancel),
 *   COMBINE_BAD_MULTIPLIER (details.reaction), and parse errors with details.reaction.
 */
export function buildCombineProblem(
  inputs: readonly (string | Equation)[],
  cancel: readonly string[],
  multipliers: readonly { readonly multiplier?: Rational | number | string }[],
): CombineProblem {
  if (inputs.length === 0) throw new ChemError('COMBINE_NO_REACTIONS', 'Give at least one reaction.', { start: 0, end: 0 });
  const equations = inputs.map(parseReaction);
  const keyOf = keyFunction(equations);
  const keys: string[] = [];
  const species: Formula[] = [];
  const net = equations.map((equation) => {
    const row = new Map<number, Rational>();
    for (const term of equation.terms) {
      const key = keyOf(term.formula);
      if (!keys.includes(key)) {
        keys.push(key);
        species.push(term.formula);
      }
      const column = keys.indexOf(key);
      const amount = term.coefficient ?? Rational.ONE;
      row.set(column, (row.get(column) ?? Rational.ZERO).add(term.side === 'right' ? amount : amount.neg()));
    }
    return row;
  });
  const dense = net.map((row) => keys.map((_, column) => row.get(column) ?? Rational.ZERO));
  const cancelRows = cancelColumns(cancel, keys, keyOf).flatMap((columns) =>
    columns.map((column) => dense.map((row) => row[column])),
  );
  const pins = new Map<number, Rational>();
  multipliers.forEach((entry, index) => {
    if (entry.multiplier !== undefined) pins.set(index, readMultiplier(entry.multiplier, index));
  });
  if (pins.size === 0) pins.set(0, Rational.ONE);
  return { species, net: dense, cancelRows, pins, warnings: unbalancedWarnings(equations) };
}

function unbalancedWarnings(equations: readonly Equation[]): ChemWarning[] {
  return equations.flatMap((equation, index): ChemWarning[] =>
    checkEquation(equation).status === 'unbalanced'
      ? [{ code: 'COMBINE_REACTION_UNBALANCED', message: `Reaction ${index + 1} is not balanced as written.` }]
      : [],
  );
}
