import { impliedReaction, solveMassBalance, type MassBalanceInput, type MassBalanceModel as EngineModel } from '@tallus/chem';
import type { MassBalanceResultView, MassBalanceSolution, MassBalanceWater } from '@tallus/contracts';
import { fieldPath } from '../site-data/chem-path';
import type { StoredPhase } from './mass-balance-model.entity';
import { MASS_BALANCE_ASSUMPTIONS } from './water-for-solver';

/** What the solver needs of a model once its waters and species are resolved. */
export interface ModelProblem {
  initial: MassBalanceWater;
  final: MassBalanceWater;
  phases: StoredPhase[];
  constraints: string[];
  uncertainty: Record<string, number>;
}

/** The engine's input of a resolved model. */
export function toEngineInput(problem: ModelProblem): MassBalanceInput {
  const hasUncertainty = Object.keys(problem.uncertainty).length > 0;
  return {
    initial: problem.initial.mmolPerKg,
    final: problem.final.mmolPerKg,
    phases: problem.phases.map((phase) => ({ name: phase.name, rule: phase.rule, ...(phase.equation ? { equation: phase.equation } : { formula: phase.formula ?? '' }) })),
    constraints: problem.constraints,
    ...(hasUncertainty ? { uncertainty: problem.uncertainty } : {}),
  };
}

function implied(input: MassBalanceInput, model: EngineModel): MassBalanceSolution['impliedReaction'] {
  try {
    const reaction = impliedReaction(input, model);
    return { status: reaction.status, equation: reaction.equation };
  } catch {
    // The model's phases already parsed in the solver; a net reaction that still fails to build is reported, not fatal.
    return { status: 'invalid', equation: null };
  }
}

function toSolution(input: MassBalanceInput, model: EngineModel): MassBalanceSolution {
  const entries = Object.entries(model.transfers);
  return {
    phases: [...model.phases],
    transfers: Object.fromEntries(entries.map(([name, value]) => [name, value.toString()])),
    transfersDecimal: Object.fromEntries(entries.map(([name, value]) => [name, value.toNumber()])),
    valid: model.valid,
    ...(model.residuals ? { residuals: { ...model.residuals } } : {}),
    ...(model.robust === undefined ? {} : { robust: model.robust }),
    ...(model.ranges ? { ranges: Object.fromEntries(Object.entries(model.ranges).map(([name, [low, high]]) => [name, [low, high] as [number, number]])) } : {}),
    impliedReaction: implied(input, model),
  };
}

/**
 * Solves a resolved model with libs/chem: every minimal model with exact
 * transfers (or the least-squares ones), each with its implied net reaction,
 * the waters as used, and the assumptions. Bad input (an equation that does not
 * parse, an unknown constraint) gives status `invalid` with the error and the
 * request path it is about, as a reaction that does not parse is saved `invalid`.
 */
export function solveModel(problem: ModelProblem, now = new Date()): MassBalanceResultView {
  const input = toEngineInput(problem);
  const result = solveMassBalance(input);
  const error = result.error
    ? { code: result.error.code, message: result.error.message, span: { start: result.error.span.start, end: result.error.span.end }, path: fieldPath(result.error.details.field) }
    : null;
  return {
    status: result.status,
    constraints: [...result.constraints],
    change: Object.fromEntries(Object.entries(result.change).map(([key, value]) => [key, value.toString()])),
    models: result.models.map((model) => toSolution(input, model)),
    notes: [...result.notes],
    error,
    initial: problem.initial,
    final: problem.final,
    assumptions: [...MASS_BALANCE_ASSUMPTIONS],
    solvedAt: now.toISOString(),
  };
}
