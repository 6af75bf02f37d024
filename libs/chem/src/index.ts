/**
 * @tallus/chem: the exact chemistry engine of Tallus. Pure TypeScript, no I/O.
 * The only entry point of the library; see libs/chem/README.md for the API with examples.
 */

// Exact numbers
export { Rational, gcdBig, lcmBig } from './rational/rational';

// Errors and warnings
export { ChemError, CHEM_ERROR_CODES, isChemError } from './errors/chem-error';
export type { ChemErrorCode, ChemErrorDetails, ChemIssue, Span } from './errors/chem-error';
export { CHEM_WARNING_CODES } from './errors/chem-warning';
export type { ChemWarning, ChemWarningCode } from './errors/chem-warning';

// Elements
export { findElement, listElements } from './elements/atomic-weights';
export type { ElementData } from './elements/atomic-weights';

// Formulas
export { parseFormula } from './formula/parse-formula';
export { formatFormula, formulaParts } from './formula/format-formula';
export type { FormulaPart } from './formula/format-formula';
export { isSameSpecies, phasedSpeciesKey, speciesKey } from './formula/species-key';
export { PHASES } from './formula/formula';
export type { ElementNode, Formula, FormulaNode, FormulaUnit, GroupNode, Phase } from './formula/formula';

// Equations
export { parseEquation } from './equation/parse-equation';
export { formatEquation } from './equation/format-equation';
export type { FormattableTerm } from './equation/format-equation';
export type { Equation, EquationTerm, Side } from './equation/equation';

// Balancing
export { balanceEquation } from './balance/balance-equation';
export type { BalancedTerm, BalanceOptions, BalanceResult, BalanceStatus } from './balance/balance-result';
export { integerNullSpace, matrixRank, reduceRows } from './balance/null-space';
export type { RowEchelon } from './balance/null-space';
export { buildSpeciesMatrix, CHARGE_ROW } from './balance/species-matrix';
export type { SpeciesMatrix } from './balance/species-matrix';

// Checking, oxidation states and budgets
export { checkEquation } from './check/check-equation';
export type { CheckOptions, CheckResult } from './check/check-equation';
export { assignOxidationStates } from './oxidation/oxidation-states';
export type { OxidationStates } from './oxidation/oxidation-states';
export { electronBudget, oxidationStateLookup } from './oxidation/electron-budget';
export type { BudgetTerm, ElectronBudget, OxidationStateMap } from './oxidation/electron-budget';
export { protonBudget } from './budget/proton-budget';
export type { ProtonBudget, ProtonBudgetOptions } from './budget/proton-budget';

// Net reactions
export { combineReactions } from './combine/combine-reactions';
export type {
  CombinedTerm,
  CombineInput,
  CombineReaction,
  CombineResult,
  CombineStatus,
} from './combine/combine-reactions';

// Conversions
export {
  caco3KgPerTonne,
  molarMass,
  molarMassExact,
  molesPerKg,
  tonnesCo2PerTonne,
} from './convert/molar-mass';

// JSON forms for the API and the command line
export { balanceToJson, checkToJson, combineToJson, massToJson } from './json/to-json';
export type { BalanceJson, CheckJson, CombineJson, MassJson } from './json/to-json';

// Water analyses: solutes, units, charge balance
export { findSolute, requireSolute, SOLUTES } from './water/solutes';
export type { Solute } from './water/solutes';
export {
  CACO3_MG_PER_MEQ,
  ASCII_UNIT_ALIASES,
  CONCENTRATION_UNITS,
  isConcentrationUnit,
  parseConcentration,
  toMilliequivalentsPerLitre,
  toMillimolesPerLitre,
} from './water/concentration';
export type { Concentration, ConcentrationUnit } from './water/concentration';
export { CHARGE_BALANCE_NOTES, chargeBalance, DEFAULT_CBE_THRESHOLD } from './water/charge-balance';
export type {
  ChargeBalanceConvention,
  ChargeBalanceNote,
  ChargeBalanceOptions,
  ChargeBalanceResult,
  SoluteValue,
  WaterAnalysis,
} from './water/charge-balance';

// Inverse mass balance
export { solveMassBalance } from './mass-balance/solve-mass-balance';
export type { MassBalanceInput, MassBalanceModel, MassBalanceResult, MassBalanceStatus } from './mass-balance/solve-mass-balance';
export { impliedReaction } from './mass-balance/implied-reaction';
export type { ImpliedReaction } from './mass-balance/implied-reaction';
export { isDissolved, phaseColumn } from './mass-balance/phase-columns';
export type { Constraint, PhaseInput, PhaseRule } from './mass-balance/phase-columns';
export { operationalValence, REDOX_ELEMENTS } from './mass-balance/operational-valence';
export { minimalFittingSubsets } from './mass-balance/minimal-subsets';
export type { FittingSubset } from './mass-balance/minimal-subsets';
export type { WaterComposition } from './mass-balance/water-change';

// Mineral formulas from oxide analyses
export { FEO_TO_FE2O3, findMineralGroup, findOxide, MINERAL_GROUPS, OXIDES, oxideMolarMass } from './oxides/oxide-table';
export type { MineralGroup, OxideEntry } from './oxides/oxide-table';
export { recalculateFormula } from './oxides/recalculate-formula';
export type { FerricIron, FormulaRecalculation, OxideAnalysis } from './oxides/recalculate-formula';
export { OXIDE_WARNINGS } from './oxides/oxide-warnings';
export type { OxideWarning } from './oxides/oxide-warnings';
export { endMembersOf } from './oxides/end-members';
export type { EndMembers } from './oxides/end-members';
export { formulaText, oxideWeightPercents, plagioclaseWeatheringEquation, weatheringEquation } from './oxides/formula-text';
export type { WeatheringProducts } from './oxides/formula-text';

// Acid-base accounting
export {
  ABA_NOTES,
  AP_FACTOR,
  AP_FACTOR_BICARBONATE,
  acidBaseAccounting,
  classifyNpr,
  DEFAULT_NPR_BANDS,
} from './aba/acid-base-accounting';
export type { AbaClass, AbaInput, AbaNote, AbaResult, NprBands } from './aba/acid-base-accounting';
export { ABA_MINERALS, mineralAcidBase, mineralFactor, SIDERITE_CAUTION } from './aba/mineral-acid-base';
export type { AbaMineral, CarbonatePathway, MineralAbaOptions, MineralAbaResult, MineralFactor } from './aba/mineral-acid-base';

// CO2 uptake
export { CO2_CAUTIONS, mineralCo2Uptake, oxideCo2Potential, rockCo2Uptake } from './co2/co2-uptake';
export type { Co2Uptake, MineralCo2Uptake, OxideCo2Potential } from './co2/co2-uptake';
