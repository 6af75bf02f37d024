/**
 * Reads oxidation states typed as `Fe 2, S -1` (or `Fe: 8/3`) into `{ Fe: '2', S: '-1' }`.
 * Blank text gives null (no explicit states). Returns an error text for anything else.
 *
 * @param text the field's text
 * @example parseOxidationStates('Fe 2, S -1'); // { states: { Fe: '2', S: '-1' } }
 */
export function parseOxidationStates(text: string): { states: Record<string, string> | null } | { error: string } {
  if (text.trim() === '') return { states: null };
  const states: Record<string, string> = {};
  for (const entry of text.split(/[,;]/).map((part) => part.trim()).filter(Boolean)) {
    const match = /^([A-Z][a-z]?)\s*[: =]\s*([+-]?\d+(?:\.\d+)?(?:\/[1-9]\d*)?)$/.exec(entry);
    if (!match) return { error: `“${entry}” does not read: write an element and its state, e.g. Fe 2, S -1 or Fe 8/3.` };
    states[match[1]] = match[2].replace(/^\+/, '');
  }
  return { states };
}

/**
 * Writes oxidation states as the field shows them.
 *
 * @param states states by element, or null
 */
export function formatOxidationStates(states: Readonly<Record<string, string>> | null): string {
  return states ? Object.entries(states).map(([element, state]) => `${element} ${state}`).join(', ') : '';
}
