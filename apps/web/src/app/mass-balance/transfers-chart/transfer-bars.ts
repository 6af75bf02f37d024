import type { MassBalanceSolution, PhaseRuleName } from '@tallus/contracts';

/** One bar of the transfers chart. */
export interface TransferBar {
  phase: string;
  /** mmol per kg of water: + dissolved, − precipitated. */
  value: number;
  /** The exact transfer, e.g. `17/250`. */
  exact: string;
  rule: PhaseRuleName;
  /** Whether the transfer breaks its phase's dissolve-only or precipitate-only rule. */
  breaksRule: boolean;
  /** Low and high ends under the measurement uncertainty, when given. */
  range: [number, number] | null;
}

/**
 * The bars of one model's mole transfers, in the model's phase order.
 *
 * @param model a model of the solver's result
 * @param rules each candidate phase's rule, by name
 */
export function transferBars(model: MassBalanceSolution, rules: Readonly<Record<string, PhaseRuleName>>): TransferBar[] {
  return model.phases.map((phase) => {
    const value = model.transfersDecimal[phase] ?? 0;
    const rule = rules[phase] ?? 'either';
    return {
      phase,
      value,
      exact: model.transfers[phase] ?? '0',
      rule,
      breaksRule: (rule === 'dissolve' && value < 0) || (rule === 'precipitate' && value > 0),
      range: model.ranges?.[phase] ?? null,
    };
  });
}
