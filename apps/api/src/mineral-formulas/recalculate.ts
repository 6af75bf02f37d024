import { balanceToJson, checkEquation, checkToJson, formulaText, massToJson, recalculateFormula, weatheringEquation } from '@tallus/chem';
import { balanceJsonSchema, type FormulaRecalculationView, type RecalculateFormulaRequest } from '@tallus/contracts';
import { withChemPath } from '../site-data/chem-path';

/** The method every saved recalculation names. */
export const RECALCULATION_METHOD =
  'Oxide wt% to atoms per formula unit on a fixed oxygen basis (Brady & Perkins, SERC "Mineral formulae recalculation"); IUPAC 2021 abridged atomic weights (Prohaska et al. 2022)';

/** The basis in words, e.g. `8 O (feldspar), Fe3+ after Droop (1987)`. */
export function basisText(request: RecalculateFormulaRequest, oxygens: number): string {
  const group = request.analysis.group ? ` (${request.analysis.group})` : '';
  const ferric = request.analysis.ferric === 'droop' ? ', Fe3+ after Droop (1987)' : ', all Fe as analysed';
  const volatiles = request.analysis.volatiles === 'include' ? ', H2O and CO2 included' : ', anhydrous';
  return `${oxygens} O${group}${ferric}${volatiles}`;
}

/**
 * Recalculates an oxide analysis with libs/chem: apfu, Fe3+ (Droop 1987 where
 * asked), end members and warnings, the formula text, and the weathering reaction
 * of 1 mol of it with its proton budget, so that budgets follow the real composition.
 *
 * @throws ChemInputError OXIDES_* at `analysis.<field>`
 */
export function recalculate(request: RecalculateFormulaRequest): FormulaRecalculationView {
  const result = withChemPath(['analysis'], () => recalculateFormula(request.analysis));
  const formula = formulaText(result.apfu, { oxygens: result.oxygens, decimals: request.decimals });
  const weathering = weatheringEquation(formula, request.products);
  const protonBudget = weathering.status === 'balanced' && weathering.equation ? checkToJson(checkEquation(weathering.equation, { reference: formula })).protonBudget : null;
  return {
    apfu: { ...result.apfu },
    oxygens: result.oxygens,
    total: result.total,
    oxideTotal: result.oxideTotal,
    ...(result.ferricIron ? { ferricIron: { ...result.ferricIron } } : {}),
    ...(result.endMembers ? { endMembers: Object.fromEntries(Object.entries(result.endMembers).filter((entry): entry is [string, number] => typeof entry[1] === 'number')) } : {}),
    warnings: result.warnings.map((warning) => ({ ...warning })),
    formula,
    molarMass: massToJson(formula).molarMass,
    weathering: balanceJsonSchema.parse(balanceToJson(weathering)),
    protonBudget,
  };
}
