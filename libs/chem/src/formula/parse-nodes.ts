/**
 * Recursive descent over the body of a formula: element symbols with subscripts, and groups in
 * `()` or `[]`, possibly nested, possibly a mixed site with stated proportions `(Mg0.9,Fe0.1)2`.
 */
import { findElement } from '../elements/atomic-weights';
import { parseCount } from './count';
import type { ElementNode, FormulaNode, GroupNode } from './formula';
import { isLower, isUpper, peek, scanError, unexpectedHere, type Scanner } from './scanner';
import { isPhaseTagAt } from './phase';

const CLOSER = { '(': ')', '[': ']' } as const;

/**
 * Reads element symbols and groups until something else comes (end, `)`, `,`, a charge, a
 * phase tag or a hydrate dot); the caller decides what that is.
 */
export function parseNodes(scanner: Scanner): FormulaNode[] {
  const nodes: FormulaNode[] = [];
  for (;;) {
    const char = peek(scanner);
    if (isUpper(char)) nodes.push(parseElement(scanner));
    else if ((char === '(' && !isPhaseTagAt(scanner)) || char === '[') nodes.push(parseGroup(scanner));
    else return nodes;
  }
}

function parseElement(scanner: Scanner): ElementNode {
  const start = scanner.pos;
  let symbol = peek(scanner);
  scanner.pos += 1;
  if (isLower(peek(scanner))) {
    symbol += peek(scanner);
    scanner.pos += 1;
  }
  if (!findElement(symbol)) {
    throw scanError(
      scanner,
      'FORMULA_UNKNOWN_ELEMENT',
      `'${symbol}' is not an element symbol from H to U.`,
      { start, end: scanner.pos },
      { symbol },
    );
  }
  const count = parseCount(scanner, 'subscript');
  return { kind: 'element', symbol, count, span: spanOf(scanner, start) };
}

function parseGroup(scanner: Scanner): GroupNode {
  const start = scanner.pos;
  const bracket = peek(scanner) as '(' | '[';
  scanner.pos += 1;
  const members = [parseMember(scanner)];
  while (peek(scanner) === ',') {
    scanner.pos += 1;
    members.push(parseMember(scanner));
  }
  if (peek(scanner) !== CLOSER[bracket]) {
    if (peek(scanner) === '' || peek(scanner) === ')' || peek(scanner) === ']') {
      throw scanError(
        scanner,
        'FORMULA_UNBALANCED_PAREN',
        `'${bracket}' is not closed by '${CLOSER[bracket]}'.`,
        { start, end: scanner.pos },
      );
    }
    throw unexpectedHere(scanner, `an element, ',' or '${CLOSER[bracket]}'`);
  }
  scanner.pos += 1;
  const closeEnd = scanner.pos;
  const count = parseCount(scanner, 'subscript');
  if (members.length > 1) checkSiteProportions(scanner, members, { start, end: closeEnd });
  return { kind: 'group', bracket, members, count, span: spanOf(scanner, start) };
}

function parseMember(scanner: Scanner): FormulaNode[] {
  const nodes = parseNodes(scanner);
  if (nodes.length === 0) {
    if (peek(scanner) === ')' || peek(scanner) === ']' || peek(scanner) === ',') {
      throw scanError(scanner, 'FORMULA_UNEXPECTED_TOKEN', 'Empty brackets or an empty site member.', {
        start: scanner.pos,
        end: scanner.pos + 1,
      });
    }
    throw unexpectedHere(scanner, 'an element symbol');
  }
  return nodes;
}

function checkSiteProportions(
  scanner: Scanner,
  members: readonly (readonly FormulaNode[])[],
  range: { start: number; end: number },
): void {
  const isStated = members.every((member) => member.every((node) => node.count !== null));
  if (isStated) return;
  const site = scanner.text.slice(range.start, range.end);
  throw scanError(
    scanner,
    'FORMULA_MIXED_SITE',
    `The mixed site ${site} has no proportions; write them, e.g. (Mg0.9,Fe0.1) or Mg1.8Fe0.2.`,
    range,
    { site },
  );
}

function spanOf(scanner: Scanner, start: number): { start: number; end: number } {
  return { start: start + scanner.offset, end: scanner.pos + scanner.offset };
}
