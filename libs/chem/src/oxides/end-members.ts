/**
 * End-member fractions of a recalculated formula.
 */

/** End-member fractions (0–1) and the Mg number. */
export interface EndMembers {
  /** Anorthite Ca/(Ca+Na+K), albite Na/(…), orthoclase K/(…): feldspars. */
  readonly An?: number;
  readonly Ab?: number;
  readonly Or?: number;
  /** Forsterite Mg/(Mg+Fe2+) and fayalite Fe2+/(Mg+Fe2+): olivines (Mn left out, as tephroite). */
  readonly Fo?: number;
  readonly Fa?: number;
  /** Mg/(Mg+Fe2+), all Fe as Fe2+ unless Fe3+ was analysed or estimated. */
  readonly mgNumber?: number;
}

function ratio(part: number, whole: number): number | undefined {
  return whole > 0 ? part / whole : undefined;
}

/**
 * End members by group: feldspar An/Ab/Or; olivine Fo/Fa; every group the Mg number.
 * @example endMembersOf({ Na: 0.62, Ca: 0.38 }, 0, 'feldspar')?.An; // 0.38
 */
export function endMembersOf(apfu: Readonly<Record<string, number>>, ferrous: number, group: string | undefined): EndMembers | undefined {
  const { Ca = 0, Na = 0, K = 0, Mg = 0 } = apfu;
  const result: Record<string, number | undefined> = { mgNumber: ratio(Mg, Mg + ferrous) };
  if (group === 'feldspar') Object.assign(result, { An: ratio(Ca, Ca + Na + K), Ab: ratio(Na, Ca + Na + K), Or: ratio(K, Ca + Na + K) });
  if (group === 'olivine') Object.assign(result, { Fo: ratio(Mg, Mg + ferrous), Fa: ratio(ferrous, Mg + ferrous) });
  const defined = Object.entries(result).filter(([, value]) => value !== undefined);
  return defined.length === 0 ? undefined : (Object.fromEntries(defined) as EndMembers);
}
