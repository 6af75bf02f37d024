import { FormControl, FormGroup } from '@angular/forms';
import { MINERAL_GROUPS, oxideWeightPercents } from '@tallus/chem';

import type { OxideInput } from '../recalculation';

/** Oxides shown first, in the order of a laboratory certificate; the others sit under "More oxides". */
export const MAIN_OXIDES = ['SiO2', 'TiO2', 'Al2O3', 'Cr2O3', 'Fe2O3', 'FeO', 'FeOT', 'Fe2O3T', 'MnO', 'MgO', 'CaO', 'Na2O', 'K2O', 'P2O5', 'H2O', 'CO2', 'SO3'] as const;
/** Rarer constituents. */
export const MORE_OXIDES = ['V2O3', 'NiO', 'ZnO', 'SrO', 'BaO', 'Li2O', 'F', 'Cl'] as const;

/** Screen names of the mineral groups, with their default basis. */
export const GROUP_OPTIONS = MINERAL_GROUPS.map((group) => ({
  key: group.key,
  label: `${group.key[0].toUpperCase()}${group.key.slice(1)} (${group.oxygens} O)`,
  oxygens: group.oxygens,
}));

/** The form of an oxide analysis. */
export type OxideForm = FormGroup<{
  name: FormControl<string>;
  group: FormControl<string>;
  oxygens: FormControl<number | null>;
  isDroop: FormControl<boolean>;
  aluminium: FormControl<'kaolinite' | 'gibbsite'>;
  iron: FormControl<'goethite' | 'Fe(OH)3' | 'Fe2+'>;
  oxides: FormGroup<Record<string, FormControl<number | null>>>;
}>;

/** A new, empty oxide-analysis form (feldspar basis). */
export function createOxideForm(): OxideForm {
  const oxides: Record<string, FormControl<number | null>> = {};
  for (const key of [...MAIN_OXIDES, ...MORE_OXIDES]) oxides[key] = new FormControl<number | null>(null);
  return new FormGroup({
    name: new FormControl('', { nonNullable: true }),
    group: new FormControl('feldspar', { nonNullable: true }),
    oxygens: new FormControl<number | null>(null),
    isDroop: new FormControl(false, { nonNullable: true }),
    aluminium: new FormControl<'kaolinite' | 'gibbsite'>('kaolinite', { nonNullable: true }),
    iron: new FormControl<'goethite' | 'Fe(OH)3' | 'Fe2+'>('goethite', { nonNullable: true }),
    oxides: new FormGroup(oxides),
  });
}

/**
 * The recalculation input of the form's raw value.
 *
 * @param value `form.getRawValue()`
 */
export function oxideInputOf(value: ReturnType<OxideForm['getRawValue']>): OxideInput {
  return {
    oxides: value.oxides,
    group: value.group,
    oxygens: value.oxygens,
    isDroop: value.isDroop,
    products: { aluminium: value.aluminium, iron: value.iron },
  };
}

/** Worked examples a user can load to see the screen work. */
export const EXAMPLES = [
  {
    label: 'Plagioclase An38 (synthetic)',
    name: 'Plagioclase An38',
    group: 'feldspar',
    oxides: roundAll(oxideWeightPercents('Na0.62Ca0.38Al1.38Si2.62O8')),
    source: 'synthetic analysis of Na0.62Ca0.38Al1.38Si2.62O8',
  },
  {
    label: 'Olivine (Colgate worked example)',
    name: 'Olivine, Colgate example',
    group: 'olivine',
    oxides: { SiO2: 34.96, FeO: 36.77, MnO: 0.52, MgO: 27.04 },
    source: 'worked example of the Colgate University mineralogy course (SiO2 34.96, FeO 36.77, MnO 0.52, MgO 27.04 wt%)',
  },
] as const;

function roundAll(oxides: Record<string, number>): Record<string, number> {
  return Object.fromEntries(Object.entries(oxides).map(([key, value]) => [key, Math.round(value * 100) / 100]));
}
