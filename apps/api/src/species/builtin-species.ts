/**
 * The built-in starter catalogue: ideal formulas of the minerals, aqueous species and gases that
 * weathering and mine-water work uses most. Read-only; teams add their own species on top of it.
 *
 * Sources of the formulas (each entry names one):
 * - DHZ: Deer, Howie & Zussman, An Introduction to the Rock-Forming Minerals, 3rd ed., Mineralogical
 *   Society, 2013 (ideal end-member formulas of silicates, oxides, carbonates, sulfides, sulfates).
 * - RH95: Robie & Hemingway, Thermodynamic properties of minerals and related substances, USGS
 *   Bulletin 2131, 1995 (formulas of the tabulated phases).
 * - SM96: Stumm & Morgan, Aquatic Chemistry, 3rd ed., Wiley, 1996 (aqueous species and gases).
 * - NA97: Nordstrom & Alpers, Geochemistry of acid mine waters, Reviews in Economic Geology 6A, 1999
 *   (sulfides and Fe(III) hydroxysulfates of acid drainage).
 * The citations are given as recalled from memory; the formulas are the standard ideal ones.
 */

/** Phase of a species, as DESIGN.md §2 names them. */
export type BuiltinPhase = 'mineral' | 'aqueous' | 'gas' | 'liquid';

/** One read-only species of the starter catalogue. */
export interface BuiltinSpecies {
  /** Stable key, unique in the catalogue. */
  readonly key: string;
  readonly name: string;
  readonly formula: string;
  readonly phase: BuiltinPhase;
  /**
   * Oxidation states per element where the usual rules cannot decide them (sulfides, mixed-valence
   * oxides). Values are exact rationals as text ("8/3").
   */
  readonly oxidationStates?: Readonly<Record<string, string>>;
  readonly source: string;
  readonly notes?: string;
}

const DHZ = 'Deer, Howie & Zussman (2013), An Introduction to the Rock-Forming Minerals, 3rd ed.';
const RH95 = 'Robie & Hemingway (1995), USGS Bulletin 2131';
const SM96 = 'Stumm & Morgan (1996), Aquatic Chemistry, 3rd ed.';
const NA99 = 'Nordstrom & Alpers (1999), Reviews in Economic Geology 6A';

const mineral = (key: string, name: string, formula: string, source: string, extra: Partial<BuiltinSpecies> = {}): BuiltinSpecies =>
  ({ key, name, formula, phase: 'mineral', source, ...extra });
const aqueous = (key: string, name: string, formula: string, extra: Partial<BuiltinSpecies> = {}): BuiltinSpecies =>
  ({ key, name, formula, phase: 'aqueous', source: SM96, ...extra });

/** The starter catalogue, in the order a practitioner scans it: silicates, carbonates, sulfides, products, solutes, gases. */
export const BUILTIN_SPECIES: readonly BuiltinSpecies[] = [
  mineral('albite', 'Albite', 'NaAlSi3O8', DHZ),
  mineral('anorthite', 'Anorthite', 'CaAl2Si2O8', DHZ),
  mineral('k-feldspar', 'K-feldspar (microcline, orthoclase)', 'KAlSi3O8', DHZ),
  mineral('forsterite', 'Forsterite', 'Mg2SiO4', DHZ),
  mineral('fayalite', 'Fayalite', 'Fe2SiO4', DHZ),
  mineral('enstatite', 'Enstatite', 'MgSiO3', DHZ),
  mineral('diopside', 'Diopside', 'CaMgSi2O6', DHZ),
  mineral('wollastonite', 'Wollastonite', 'CaSiO3', DHZ),
  mineral('phlogopite', 'Phlogopite (Mg biotite)', 'KMg3AlSi3O10(OH)2', DHZ),
  mineral('annite', 'Annite (Fe biotite)', 'KFe3AlSi3O10(OH)2', DHZ),
  mineral('muscovite', 'Muscovite', 'KAl3Si3O10(OH)2', DHZ),
  mineral('chrysotile', 'Serpentine (chrysotile)', 'Mg3Si2O5(OH)4', DHZ),
  mineral('quartz', 'Quartz', 'SiO2', DHZ),
  mineral('kaolinite', 'Kaolinite', 'Al2Si2O5(OH)4', DHZ),
  mineral('gibbsite', 'Gibbsite', 'Al(OH)3', RH95),
  mineral('calcite', 'Calcite', 'CaCO3', DHZ),
  mineral('dolomite', 'Dolomite', 'CaMg(CO3)2', DHZ),
  mineral('magnesite', 'Magnesite', 'MgCO3', DHZ),
  mineral('siderite', 'Siderite', 'FeCO3', DHZ),
  mineral('ankerite', 'Ankerite (ideal)', 'CaFe(CO3)2', DHZ, { notes: 'Natural ankerite carries Mg and Mn: enter the measured composition as a team species.' }),
  mineral('pyrite', 'Pyrite', 'FeS2', NA99, { oxidationStates: { Fe: '2', S: '-1' }, notes: 'Disulfide: Fe(II) and S(-I).' }),
  mineral('pyrrhotite', 'Pyrrhotite (troilite end-member)', 'FeS', NA99, { oxidationStates: { Fe: '2', S: '-2' }, notes: 'Natural pyrrhotite is Fe(1-x)S: enter the measured x as a team species.' }),
  mineral('chalcopyrite', 'Chalcopyrite', 'CuFeS2', NA99, { oxidationStates: { Cu: '1', Fe: '3', S: '-2' }, notes: 'Formal states Cu(I), Fe(III), S(-II).' }),
  mineral('arsenopyrite', 'Arsenopyrite', 'FeAsS', NA99, { oxidationStates: { Fe: '2', As: '-1', S: '-1' }, notes: 'Formal states Fe(II), As(-I), S(-I); other conventions exist.' }),
  mineral('sphalerite', 'Sphalerite', 'ZnS', NA99, { oxidationStates: { Zn: '2', S: '-2' } }),
  mineral('galena', 'Galena', 'PbS', NA99, { oxidationStates: { Pb: '2', S: '-2' } }),
  mineral('magnetite', 'Magnetite', 'Fe3O4', DHZ, { oxidationStates: { Fe: '8/3', O: '-2' }, notes: 'Mixed valence: average Fe state 8/3.' }),
  mineral('hematite', 'Hematite', 'Fe2O3', DHZ),
  mineral('goethite', 'Goethite', 'FeOOH', DHZ),
  mineral('ferric-hydroxide', 'Ferric hydroxide (amorphous)', 'Fe(OH)3', NA99, { notes: 'Idealised formula of freshly precipitated ferrihydrite.' }),
  mineral('gypsum', 'Gypsum', 'CaSO4·2H2O', DHZ),
  mineral('anhydrite', 'Anhydrite', 'CaSO4', DHZ),
  mineral('jarosite', 'Jarosite', 'KFe3(SO4)2(OH)6', NA99),
  mineral('melanterite', 'Melanterite', 'FeSO4·7H2O', NA99),
  mineral('fluorite', 'Fluorite', 'CaF2', DHZ),
  { key: 'water', name: 'Water', formula: 'H2O', phase: 'liquid', source: SM96 },
  aqueous('proton', 'Hydrogen ion', 'H+'),
  aqueous('hydroxide', 'Hydroxide', 'OH-'),
  aqueous('silicic-acid', 'Silicic acid (dissolved silica)', 'H4SiO4'),
  aqueous('calcium', 'Calcium ion', 'Ca^2+'),
  aqueous('magnesium', 'Magnesium ion', 'Mg^2+'),
  aqueous('sodium', 'Sodium ion', 'Na+'),
  aqueous('potassium', 'Potassium ion', 'K+'),
  aqueous('ferrous', 'Iron(II) ion', 'Fe^2+'),
  aqueous('ferric', 'Iron(III) ion', 'Fe^3+'),
  aqueous('aluminium', 'Aluminium ion', 'Al^3+'),
  aqueous('manganese', 'Manganese(II) ion', 'Mn^2+'),
  aqueous('zinc', 'Zinc ion', 'Zn^2+'),
  aqueous('copper', 'Copper(II) ion', 'Cu^2+'),
  aqueous('bicarbonate', 'Bicarbonate', 'HCO3-'),
  aqueous('carbonate', 'Carbonate', 'CO3^2-'),
  aqueous('carbonic-acid', 'Carbonic acid', 'H2CO3'),
  aqueous('sulfate', 'Sulfate', 'SO4^2-'),
  aqueous('chloride', 'Chloride', 'Cl-'),
  aqueous('fluoride', 'Fluoride', 'F-'),
  aqueous('nitrate', 'Nitrate', 'NO3-'),
  aqueous('arsenate', 'Arsenate (H2AsO4-)', 'H2AsO4-'),
  { key: 'carbon-dioxide', name: 'Carbon dioxide', formula: 'CO2', phase: 'gas', source: SM96 },
  { key: 'oxygen', name: 'Oxygen', formula: 'O2', phase: 'gas', source: SM96 },
  { key: 'hydrogen', name: 'Hydrogen', formula: 'H2', phase: 'gas', source: SM96 },
  { key: 'hydrogen-sulfide', name: 'Hydrogen sulfide', formula: 'H2S', phase: 'gas', source: SM96 },
];
