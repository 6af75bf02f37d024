/**
 * Exact composition of a formula tree: atoms of each element, in order of first appearance.
 */
import { Rational } from '../rational/rational';
import type { FormulaNode, FormulaUnit } from './formula';

function addNodes(total: Map<string, Rational>, nodes: readonly FormulaNode[], factor: Rational): void {
  for (const node of nodes) {
    const times = node.count === null ? factor : factor.mul(node.count);
    if (node.kind === 'element') {
      total.set(node.symbol, (total.get(node.symbol) ?? Rational.ZERO).add(times));
    } else {
      for (const member of node.members) addNodes(total, member, times);
    }
  }
}

/**
 * Atoms of each element in the formula units (hydrate parts multiplied by their count).
 * @example compositionOf(parseFormula('CaSO4·2H2O').units).get('O')?.toString(); // "6"
 */
export function compositionOf(units: readonly FormulaUnit[]): ReadonlyMap<string, Rational> {
  const total = new Map<string, Rational>();
  for (const unit of units) addNodes(total, unit.nodes, unit.count ?? Rational.ONE);
  return total;
}
