/**
 * The solutes a water analysis may hold: the formula their mass is reported as, the aqueous
 * species assumed for charge and for reactions, and whether they count in the charge balance.
 */
import { ChemError, type Span } from '../errors/chem-error';

/** One solute of a water analysis. */
export interface Solute {
  /** Key used in analyses and mass-balance files (`Ca`, `SO4`, `alkalinity`, …). */
  readonly key: string;
  /** Human label. */
  readonly label: string;
  /** The formula whose molar mass converts mg/L to mmol/L (`SO4^2-`, `SiO2`, `C` for DIC). */
  readonly formula: string;
  /** The aqueous species assumed in solution (`Fe^2+`, `H4SiO4`, `HCO3-`), for reactions and redox. */
  readonly species: string;
  /** Charge per mole used for meq/L (0 for neutral solutes). */
  readonly charge: number;
  /** Whether the solute counts in the charge balance (false for SiO2, Si, DIC). */
  readonly inChargeBalance: boolean;
  /** Whether the solute carries carbon that DIC, when also given, already counts. */
  readonly isCarbonateAlkalinity: boolean;
}

function solute(key: string, label: string, formula: string, species: string, charge: number): Solute {
  return {
    key,
    label,
    formula,
    species,
    charge,
    inChargeBalance: charge !== 0,
    isCarbonateAlkalinity: key === 'HCO3' || key === 'CO3' || key === 'alkalinity',
  };
}

/**
 * Every solute Tallus knows, cations first. Conventions:
 * - `Fe` is ferrous iron (Fe²⁺, the dissolved form in most ground and mine waters at pH < 7 with
 *   little O2); a lab's ferric iron goes under `Fe3`. Laboratories usually report total Fe: enter
 *   it as `Fe` and say so in the report.
 * - `Al` is counted as Al³⁺; above pH ≈ 5 hydroxo complexes carry less charge (see the low-pH note
 *   of the charge balance).
 * - `SiO2` and `Si` are neutral (H4SiO4 below pH 9) and never enter the charge balance.
 * - `alkalinity` is carbonate alkalinity counted as HCO3⁻ (charge −1): give it in meq/L, mmol/L,
 *   `mg/L as HCO3` or `mg/L as CaCO3` (1 meq = 50.043 mg CaCO3 = M(CaCO3)/2, Standard Methods 2320).
 *   `HCO3` is bicarbonate in mg/L of HCO3⁻. Give one or the other, not both.
 * - `DIC` is dissolved inorganic carbon as C (mg/L of C), neutral: it does not enter the charge
 *   balance; in a mass balance it replaces the carbon of `HCO3`, `CO3` and `alkalinity`.
 */
export const SOLUTES: readonly Solute[] = [
  solute('Ca', 'calcium', 'Ca^2+', 'Ca^2+', 2),
  solute('Mg', 'magnesium', 'Mg^2+', 'Mg^2+', 2),
  solute('Na', 'sodium', 'Na+', 'Na+', 1),
  solute('K', 'potassium', 'K+', 'K+', 1),
  solute('Fe', 'iron(II)', 'Fe^2+', 'Fe^2+', 2),
  solute('Fe3', 'iron(III)', 'Fe^3+', 'Fe^3+', 3),
  solute('Mn', 'manganese(II)', 'Mn^2+', 'Mn^2+', 2),
  solute('Al', 'aluminium', 'Al^3+', 'Al^3+', 3),
  solute('Sr', 'strontium', 'Sr^2+', 'Sr^2+', 2),
  solute('Ba', 'barium', 'Ba^2+', 'Ba^2+', 2),
  solute('Zn', 'zinc', 'Zn^2+', 'Zn^2+', 2),
  solute('Cu', 'copper(II)', 'Cu^2+', 'Cu^2+', 2),
  solute('Ni', 'nickel', 'Ni^2+', 'Ni^2+', 2),
  solute('NH4', 'ammonium', 'NH4+', 'NH4+', 1),
  solute('Cl', 'chloride', 'Cl-', 'Cl-', -1),
  solute('SO4', 'sulfate', 'SO4^2-', 'SO4^2-', -2),
  solute('NO3', 'nitrate', 'NO3-', 'NO3-', -1),
  solute('F', 'fluoride', 'F-', 'F-', -1),
  solute('Br', 'bromide', 'Br-', 'Br-', -1),
  solute('HCO3', 'bicarbonate', 'HCO3-', 'HCO3-', -1),
  solute('CO3', 'carbonate', 'CO3^2-', 'CO3^2-', -2),
  solute('alkalinity', 'alkalinity (as HCO3-)', 'HCO3-', 'HCO3-', -1),
  solute('SiO2', 'silica as SiO2', 'SiO2', 'H4SiO4', 0),
  solute('Si', 'silicon as Si', 'Si', 'H4SiO4', 0),
  solute('DIC', 'dissolved inorganic carbon as C', 'C', 'CO2(aq)', 0),
];

const BY_KEY: ReadonlyMap<string, Solute> = new Map(SOLUTES.map((entry) => [entry.key, entry]));

/**
 * The solute with this key, or `undefined`.
 * @example findSolute('SO4')?.charge; // -2
 */
export function findSolute(key: string): Solute | undefined {
  return BY_KEY.get(key);
}

/**
 * The solute with this key.
 * @param field the field path named in the error's details (e.g. `solutes.Cax`)
 * @throws ChemError WATER_UNKNOWN_SOLUTE (span over the key)
 * @example requireSolute('Ca', 'solutes.Ca').formula; // "Ca^2+"
 */
export function requireSolute(key: string, field: string): Solute {
  const found = BY_KEY.get(key);
  if (found !== undefined) return found;
  const span: Span = { start: 0, end: key.length };
  throw new ChemError('WATER_UNKNOWN_SOLUTE', `Unknown solute "${key}"; use one of ${SOLUTES.map((entry) => entry.key).join(', ')}.`, span, {
    field,
    key,
  });
}
