import type { ReactionKind, ReviewState } from '@tallus/contracts';
import type { SetContent } from '../../transfer/create-set-from-content';

/**
 * The demo's reaction sets (DESIGN.md §6). Teams, sites and samples are
 * invented and labelled as such; the reactions are the published ones of
 * shared/reference/check-values.md §2, cited to their sources.
 */
export interface DemoReactionSet {
  team: string;
  /** Where the demo leaves it: a draft, under review (submitted by the editor), or vetted as revision 1 and published. */
  state: Extract<ReviewState, 'draft' | 'in_review'> | 'published';
  content: SetContent;
}

const reaction = (name: string, kind: ReactionKind, equation: string, citation: string, notes = '') => ({ name, kind, equation, reference: null, citation, notes });

const ITASCA = 'Itasca Denver, waste-rock characterisation report to Colorado DRMS';
const STUMM_MORGAN_SCHEME = 'Pyrite oxidation scheme after Stumm & Morgan, as given in the Colorado DRMS report';

/** Kestrel Flats: sulfide waste rock at the made-up Tarnwick Hill mine. */
const WASTE_ROCK: SetContent = {
  set: {
    name: 'Waste-rock sulfide oxidation (invented scenario)',
    description: 'Invented demo data: acid generation and carbonate neutralisation in the waste-rock dump of the made-up Tarnwick Hill mine. Reactions and citations are published ones.',
    site: 'Tarnwick Hill waste-rock dump (invented)',
  },
  reactions: [
    reaction('Pyrite oxidation by O2 to Fe2+', 'oxidation', 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+', 'Reitner & Thiel (2011), Encyclopedia of Geobiology, "Pyrite oxidation"'),
    reaction('Ferrous iron oxidation', 'oxidation', '4 Fe^2+ + O2 + 4 H+ -> 4 Fe^3+ + 2 H2O', STUMM_MORGAN_SCHEME),
    reaction('Ferric hydroxide precipitation', 'precipitation', 'Fe^3+ + 3 H2O -> Fe(OH)3 + 3 H+', STUMM_MORGAN_SCHEME),
    reaction('Pyrite oxidation by Fe3+', 'oxidation', 'FeS2 + 14 Fe^3+ + 8 H2O -> 15 Fe^2+ + 2 SO4^2- + 16 H+', STUMM_MORGAN_SCHEME),
    reaction('Calcite neutralisation to bicarbonate', 'dissolution', 'CaCO3 + H+ -> Ca^2+ + HCO3-', `${ITASCA}, eq. 3.3`, '1 mol acid per mol calcite.'),
    reaction('Dolomite neutralisation to bicarbonate', 'dissolution', 'CaMg(CO3)2 + 2 H+ -> Ca^2+ + Mg^2+ + 2 HCO3-', 'Standard textbook form; balance checked by Tallus'),
    reaction('Pyrrhotite oxidation (sample composition)', 'oxidation', 'Fe0.9S + O2 + H2O -> Fe^2+ + SO4^2- + H+', 'Balanced by Tallus for the invented Fe0.9S sample', 'Uses the team species Pyrrhotite Fe0.9S.'),
  ],
  netReactions: [
    {
      name: 'Pyrite to ferric hydroxide (Fe2+ and Fe3+ cancelled)',
      members: [
        { index: 0, multiplier: null },
        { index: 1, multiplier: null },
        { index: 2, multiplier: null },
      ],
      cancel: ['Fe^2+', 'Fe^3+'],
    },
  ],
  species: [
    { name: 'Pyrrhotite Fe0.9S (invented waste-rock sample)', formula: 'Fe0.9S', phase: 'mineral', oxidationStates: { Fe: '20/9', S: '-2' }, notes: 'Invented demo composition.', source: 'invented' },
  ],
};

const TAILINGS: SetContent = {
  set: {
    name: 'Tailings pore-water neutralisation (invented scenario)',
    description: 'Invented demo data: carbonate buffering and secondary minerals in the made-up Tarnwick Hill tailings facility.',
    site: 'Tarnwick Hill tailings facility (invented)',
  },
  reactions: [
    reaction('Calcite neutralisation to CO2', 'dissolution', 'CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O', 'Basis of the 31.25 AP factor (2 mol H+ per mol CaCO3); balance checked by Tallus'),
    reaction('Siderite oxidation and hydrolysis', 'oxidation', '4 FeCO3 + O2 + 6 H2O -> 4 Fe(OH)3 + 4 CO2', 'Skousen et al. (1997): siderite adds no net neutralisation; balance checked by Tallus'),
    reaction('Gypsum precipitation', 'precipitation', 'Ca^2+ + SO4^2- + 2 H2O -> CaSO4·2H2O', 'Standard textbook form'),
  ],
  netReactions: [],
  species: [],
};

/** Ironbark Creek: the made-up basalt field trial for enhanced weathering. */
const BASALT_TRIAL: SetContent = {
  set: {
    name: 'Basalt field trial weathering (invented scenario)',
    description: 'Invented demo data: carbonic-acid weathering of the minerals of the crushed basalt spread on the made-up Ironbark Creek plots.',
    site: 'Ironbark Creek trial plots (invented)',
  },
  reactions: [
    reaction('Forsterite, carbonic-acid weathering', 'dissolution', 'Mg2SiO4 + 4 CO2 + 4 H2O -> 2 Mg^2+ + 4 HCO3- + H4SiO4', 'Schuiling, olivine weathering (reproduced in check-values R13b)'),
    reaction('Olivine Fo90, carbonic-acid weathering', 'dissolution', 'Mg1.8Fe0.2SiO4 + CO2 + H2O -> Mg^2+ + Fe^2+ + HCO3- + H4SiO4', 'Balanced by Tallus for the invented Fo90 sample', 'Fe2+ is assumed to stay dissolved here; it oxidises in the field.'),
    reaction('Anorthite to kaolinite, carbonic acid', 'alteration', 'CaAl2Si2O8 + 2 H2CO3 + H2O -> Al2Si2O5(OH)4 + Ca^2+ + 2 HCO3-', 'Andrews et al., An Introduction to Environmental Chemistry, eq. 4.13'),
    reaction('Diopside, carbonic-acid weathering', 'dissolution', 'CaMgSi2O6 + 4 CO2 + 6 H2O -> Ca^2+ + Mg^2+ + 4 HCO3- + 2 H4SiO4', 'Balance checked by Tallus'),
    reaction('Albite to kaolinite', 'alteration', '2 NaAlSi3O8 + 2 H+ + 9 H2O -> Al2Si2O5(OH)4 + 2 Na+ + 4 H4SiO4', 'Harrison (ed.) (2007), Principles of Environmental Chemistry, eq. 3.21'),
    reaction('Plagioclase An38 to kaolinite', 'alteration', 'Na0.62Ca0.38Al1.38Si2.62O8 + H+ + H2O -> Al2Si2O5(OH)4 + Na+ + Ca^2+ + H4SiO4', 'Garrels & Mackenzie An38 composition; balanced by Tallus'),
    reaction('Wollastonite, carbonic-acid weathering', 'dissolution', 'CaSiO3 + 2 CO2 + 3 H2O -> Ca^2+ + 2 HCO3- + H4SiO4', 'Balance checked by Tallus'),
    reaction('CO2 dissolution', 'gas_exchange', 'CO2 + H2O -> H2CO3', 'Stumm & Morgan (1996), Aquatic Chemistry'),
  ],
  netReactions: [],
  species: [
    { name: 'Plagioclase An38 (invented trial sample)', formula: 'Na0.62Ca0.38Al1.38Si2.62O8', phase: 'mineral', oxidationStates: null, notes: 'Invented sample; composition of Garrels & Mackenzie (1967).', source: 'invented' },
    { name: 'Olivine Fo90 (invented trial sample)', formula: 'Mg1.8Fe0.2SiO4', phase: 'mineral', oxidationStates: null, notes: 'Invented sample.', source: 'invented' },
  ],
};

/** The demo sets, with the state the demo leaves each in. */
export const DEMO_REACTION_SETS: readonly DemoReactionSet[] = [
  { team: 'Kestrel Flats', state: 'published', content: WASTE_ROCK },
  { team: 'Kestrel Flats', state: 'in_review', content: TAILINGS },
  { team: 'Ironbark Creek', state: 'draft', content: BASALT_TRIAL },
];
