/**
 * Canonical text of a formula (ASCII except the hydrate dot `·`), which `parseFormula` reads back
 * to the same tree, and the structured form the client renders with real sub- and superscripts.
 */
import type { Rational } from '../rational/rational';
import type { Formula, FormulaNode, FormulaUnit } from './formula';
import { isChargeAmbiguous } from './parse-formula';

/** One run of a rendered formula: plain text, a subscript, or a superscript (the charge). */
export interface FormulaPart {
  readonly kind: 'text' | 'subscript' | 'superscript';
  readonly text: string;
}

function countText(count: Rational | null): string {
  if (count === null || (count.isInteger() && count.num === 1n)) return '';
  return count.toDecimalString() ?? count.toString();
}

function pushPart(parts: FormulaPart[], kind: FormulaPart['kind'], text: string): void {
  if (text === '') return;
  const last = parts[parts.length - 1];
  if (last !== undefined && last.kind === kind) parts[parts.length - 1] = { kind, text: last.text + text };
  else parts.push({ kind, text });
}

function nodeParts(parts: FormulaPart[], nodes: readonly FormulaNode[]): void {
  for (const node of nodes) {
    if (node.kind === 'element') {
      pushPart(parts, 'text', node.symbol);
    } else {
      pushPart(parts, 'text', node.bracket);
      node.members.forEach((member, index) => {
        if (index > 0) pushPart(parts, 'text', ',');
        nodeParts(parts, member);
      });
      pushPart(parts, 'text', node.bracket === '(' ? ')' : ']');
    }
    pushPart(parts, 'subscript', countText(node.count));
  }
}

function unitParts(parts: FormulaPart[], units: readonly FormulaUnit[]): void {
  units.forEach((unit, index) => {
    if (index > 0) pushPart(parts, 'text', `·${countText(unit.count)}`);
    nodeParts(parts, unit.nodes);
  });
}

function chargeText(formula: Formula): string {
  const sign = formula.charge.sign() < 0 ? '-' : '+';
  const magnitude = formula.charge.abs();
  if (magnitude.isZero()) return '';
  if (magnitude.num === 1n) return sign;
  return `${magnitude.toString()}${sign}`;
}

/**
 * The formula as runs of text, subscripts and one superscript (the charge), for rendering.
 * @example
 * formulaParts(parseFormula('SO4^2-'));
 * // [{kind:'text',text:'SO'},{kind:'subscript',text:'4'},{kind:'superscript',text:'2-'}]
 */
export function formulaParts(formula: Formula): FormulaPart[] {
  const parts: FormulaPart[] = [];
  if (formula.isElectron) {
    pushPart(parts, 'text', 'e');
  } else {
    unitParts(parts, formula.units);
  }
  pushPart(parts, 'superscript', chargeText(formula));
  if (formula.phase !== null) pushPart(parts, 'text', `(${formula.phase})`);
  return parts;
}

/**
 * Canonical text: `^n±` for charges beyond ±1, a bare `+`/`-` for ±1 (or `^+` where a bare
 * sign would be ambiguous), subscripts of 1 left out, decimals as decimals, `·` for hydrates.
 * @example formatFormula(parseFormula('Ca²⁺')); // "Ca^2+"
 * @example formatFormula(parseFormula('CaSO4*2H2O(s)')); // "CaSO4·2H2O(s)"
 */
export function formatFormula(formula: Formula): string {
  if (formula.isElectron) return 'e-';
  let text = '';
  for (const part of formulaParts({ ...formula, phase: null })) {
    if (part.kind !== 'superscript') text += part.text;
  }
  text += canonicalCharge(formula);
  return formula.phase === null ? text : `${text}(${formula.phase})`;
}

function canonicalCharge(formula: Formula): string {
  const text = chargeText(formula);
  if (text.length <= 1) return text === '' || !isChargeAmbiguous(formula.units) ? text : `^${text}`;
  return `^${text}`;
}
