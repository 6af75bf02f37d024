import type { ReactionSetDetail } from '@tallus/contracts';
import type { PdfContent } from './pdf-document';

const fixed = (value: number | null | undefined, digits = 3): string => (value === null || value === undefined ? '–' : value.toFixed(digits));

function residualText(residuals: Record<string, string>): string {
  const off = Object.entries(residuals).filter(([, value]) => value !== '0');
  return off.length === 0 ? 'none' : off.map(([key, value]) => `${key} ${value}`).join(', ');
}

/** A set's header lines: review state, revision, who submitted and vetted. */
export function setHeader(set: ReactionSetDetail): PdfContent {
  const lastVetted = set.revisions.at(-1);
  return {
    stack: [
      { text: set.name, style: 'h2' },
      { text: `Site: ${set.site || '–'}. Review state: ${set.reviewState}; current vetted revision: ${set.currentRevision || 'none'}${lastVetted ? ` (vetted by ${lastVetted.vettedBy?.displayName ?? 'a former member'} on ${lastVetted.vettedAt.slice(0, 10)})` : ''}; version ${set.version}.` },
      ...(set.description ? [{ text: set.description, style: 'small' }] : []),
    ],
    margin: [0, 8, 0, 4],
  };
}

/** The reactions of a set with their stored checks and budgets. */
export function reactionsTable(set: ReactionSetDetail): PdfContent {
  const body = [
    ['#', 'Reaction', 'Status', 'Balanced equation', 'H+ per mol', 'H+ mol/kg', 'kg CaCO3/t', 'e− transferred', 'O2 demand', 'Residuals'].map((text) => ({ text, style: 'th' })),
    ...set.reactions.map((reaction) => [
      String(reaction.position + 1),
      { text: [{ text: reaction.name, bold: true }, reaction.citation ? { text: `\n${reaction.citation}`, style: 'small' } : ''] },
      reaction.result.status,
      { text: reaction.result.balancedEquation ?? reaction.equation, style: 'equation' },
      reaction.result.protonBudget?.perMole ?? '–',
      fixed(reaction.result.protonBudget?.perKg),
      fixed(reaction.result.protonBudget?.caco3KgPerTonne, 1),
      reaction.result.electrons?.transferred ?? '–',
      reaction.result.electrons?.o2Demand ?? '–',
      residualText(reaction.result.residuals),
    ]),
  ];
  return { table: { headerRows: 1, widths: [14, 90, 44, '*', 36, 36, 40, 36, 36, 50], body }, layout: 'lightHorizontalLines', style: 'table' };
}

/** The net reactions of a set with their multipliers and budgets. */
export function netReactionsTable(set: ReactionSetDetail): PdfContent {
  if (set.netReactions.length === 0) return { text: 'No net reactions.', style: 'small' };
  const names = new Map(set.reactions.map((reaction) => [reaction.id, reaction.name]));
  const body = [
    ['Net reaction', 'Status', 'Members × multiplier', 'Cancelled', 'Net equation', 'H+ per mol'].map((text) => ({ text, style: 'th' })),
    ...set.netReactions.map((net) => [
      { text: net.name, bold: true },
      net.result.status,
      net.reactions.map((member, index) => `${names.get(member.reactionId) ?? member.reactionId} × ${net.result.multipliers[index] ?? member.multiplier ?? '?'}`).join('\n'),
      net.cancel.join(', '),
      { text: net.result.equation ?? '–', style: 'equation' },
      net.result.protonBudget?.perMole ?? '–',
    ]),
  ];
  return { table: { headerRows: 1, widths: [80, 44, 110, 60, '*', 40], body }, layout: 'lightHorizontalLines', style: 'table' };
}

/** The whole section of one set. */
export function reactionSetSection(set: ReactionSetDetail): PdfContent[] {
  return [setHeader(set), { text: 'Reactions', style: 'h3' }, reactionsTable(set), { text: 'Net reactions', style: 'h3' }, netReactionsTable(set)];
}
