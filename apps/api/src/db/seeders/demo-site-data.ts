import type { CreateMassBalanceModelInput, CreateRockSampleInput, CreateWaterAnalysisInput, SaveMineralFormulaInput } from '@tallus/contracts';

/**
 * The demo's site data (DESIGN.md §6): water analyses, mass-balance models,
 * rock samples and microprobe analyses of the two invented teams. Every name
 * says "(invented)"; the numbers are made up to look like real site data. The
 * two mass-balance models are built forward from chosen transfers, so their
 * exact models recover them (Kestrel: pyrite 2, calcite 3, dolomite 0.45,
 * Fe(OH)3 −1.7, CO2 −2.9, O2 7.425 mmol/kg; Ironbark: forsterite 0.2,
 * diopside 0.05, anorthite 0.1, kaolinite −0.1, CO2 1.2 mmol/kg).
 */
export interface DemoSiteData {
  team: string;
  waters: CreateWaterAnalysisInput[];
  /** Models name their waters by sample name (null: pure water). */
  models: Array<Omit<CreateMassBalanceModelInput, 'initialWaterId' | 'finalWaterId'> & { initialWater: string | null; finalWater: string }>;
  rocks: CreateRockSampleInput[];
  /** Saved as species; the weathering reaction goes into the named set of the team. */
  formulas: Array<Omit<SaveMineralFormulaInput, 'reactionSetId'> & { reactionSet: string | null }>;
}

const mmol = (values: Record<string, string>) => Object.fromEntries(Object.entries(values).map(([key, value]) => [key, { value, unit: 'mmol/L' }]));
const mg = (values: Record<string, string>) => Object.fromEntries(Object.entries(values).map(([key, value]) => [key, { value, unit: key === 'alkalinity' ? 'mg/L as CaCO3' : 'mg/L' }]));

const TAILINGS = 'Tarnwick Hill tailings facility (invented)';
const DUMP = 'Tarnwick Hill waste-rock dump (invented)';
const TRIAL = 'Ironbark Creek trial plots (invented)';

const KESTREL: DemoSiteData = {
  team: 'Kestrel Flats',
  waters: [
    { name: 'KF-MW-01 upgradient well (invented)', site: TAILINGS, sampledOn: '2026-03-04', temperatureC: 11.2, pH: 7.4, solutes: mmol({ Ca: '1.2', Mg: '0.45', Na: '0.6', K: '0.05', Fe: '<0.001', SO4: '0.35', Cl: '0.55', alkalinity: '2.6', SiO2: '0.15' }), notes: 'Invented demo analysis: background groundwater upgradient of the tailings facility. Fe below detection.' },
    { name: 'KF-SP-02 tailings toe seep (invented)', site: TAILINGS, sampledOn: '2026-03-04', temperatureC: 13.8, pH: 6.6, solutes: mmol({ Ca: '4.65', Mg: '0.9', Na: '0.7', K: '0.08', Fe: '0.3', SO4: '4.35', Cl: '0.6', alkalinity: '3.6', SiO2: '0.2' }), notes: 'Invented demo analysis: circumneutral seep at the toe of the tailings embankment, sulfate-rich from sulfide oxidation buffered by carbonate.' },
    { name: 'KF-MW-03 downgradient well (invented)', site: TAILINGS, sampledOn: '2026-03-05', temperatureC: 12.4, pH: 7.1, solutes: mg({ Ca: '120', Mg: '30', Na: '25', K: '4', Fe: '<0.005', SO4: '180', Cl: '35', alkalinity: '180', SiO2: '14' }), notes: 'Invented demo analysis. CBE above the threshold: check for an unreported cation deficit or under-reported alkalinity before using this water.' },
    { name: 'KF-MW-05 dump drainage well (invented)', site: DUMP, sampledOn: '2026-03-05', temperatureC: 14.9, pH: 3.9, solutes: mg({ Ca: '60', Mg: '25', Na: '12', K: '2', Fe: '45', Mn: '3.5', Al: '12', SO4: '420', Cl: '20', SiO2: '38' }), notes: 'Invented demo analysis: acid drainage below the waste-rock dump, pH below 4.5, so the charge balance from free-ion charges is only indicative. Fe reported as total Fe, entered as Fe2+.' },
    { name: 'KF-MW-06 background well (invented)', site: DUMP, sampledOn: '2026-03-06', temperatureC: 10.6, pH: 7.8, solutes: mg({ Ca: '38', Mg: '9.5', Na: '11', K: '1.6', Fe: '<0.005', SO4: '22', Cl: '14', alkalinity: '118', NO3: '2.1', F: '0.2', SiO2: '11' }), notes: 'Invented demo analysis: background well east of the dump.' },
  ],
  models: [
    {
      name: 'Tailings seep from upgradient groundwater (invented)',
      description: 'Invented demo model: which transfers turn the upgradient water into the toe seep? Pyrite oxidation by O2, calcite and dolomite dissolution, ferric hydroxide precipitation, CO2 degassing; gypsum as an alternative.',
      initialWater: 'KF-MW-01 upgradient well (invented)',
      finalWater: 'KF-SP-02 tailings toe seep (invented)',
      phases: [
        { name: 'pyrite', speciesId: 'builtin:pyrite', rule: 'dissolve' },
        { name: 'calcite', speciesId: 'builtin:calcite', rule: 'dissolve' },
        { name: 'dolomite', speciesId: 'builtin:dolomite', rule: 'dissolve' },
        { name: 'gypsum', speciesId: 'builtin:gypsum', rule: 'either' },
        { name: 'Fe(OH)3', speciesId: 'builtin:ferric-hydroxide', rule: 'precipitate' },
        { name: 'O2', formula: 'O2(g)', rule: 'dissolve' },
        { name: 'CO2', formula: 'CO2(g)', rule: 'either' },
      ],
      constraints: ['Ca', 'Mg', 'Fe', 'S', 'C', 'electrons'],
      uncertainty: { Ca: 5, SO4: 5, alkalinity: 5 },
    },
  ],
  rocks: [
    { name: 'KF-WR-01 (invented)', site: DUMP, depthFromM: 0, depthToM: 3, lithology: 'altered andesite', totalSulfurPercent: 2.1, sulfideSulfurPercent: 1.95, sulfateSulfurPercent: 0.12, neutralisationPotential: 12, pastePh: 6.1, modes: [{ mineral: 'pyrite', weightPercent: 3.6 }, { mineral: 'calcite', weightPercent: 1.0 }], notes: 'Invented demo sample.' },
    { name: 'KF-WR-02 (invented)', site: DUMP, depthFromM: 3, depthToM: 6, lithology: 'altered andesite', totalSulfurPercent: 1.4, sulfideSulfurPercent: 1.3, sulfateSulfurPercent: 0.08, neutralisationPotential: 35, pastePh: 7.2, modes: [{ mineral: 'pyrite', weightPercent: 2.4 }, { mineral: 'calcite', weightPercent: 3.2 }], notes: 'Invented demo sample.' },
    { name: 'KF-WR-03 (invented)', site: DUMP, depthFromM: 6, depthToM: 9, lithology: 'siderite-bearing mudstone', totalSulfurPercent: 0.85, sulfideSulfurPercent: 0.78, sulfateSulfurPercent: 0.05, neutralisationPotential: 48, pastePh: 7.6, modes: [{ mineral: 'pyrite', weightPercent: 1.45 }, { mineral: 'calcite', weightPercent: 4.5 }, { mineral: 'siderite', weightPercent: 1.2 }], notes: 'Invented demo sample: part of the measured NP is siderite (see the caution).' },
    { name: 'KF-WR-04 (invented)', site: DUMP, depthFromM: 9, depthToM: 12, lithology: 'andesite', totalSulfurPercent: 0.6, sulfideSulfurPercent: 0.52, sulfateSulfurPercent: 0.06, neutralisationPotential: 41, pastePh: 7.8, modes: [], notes: 'Invented demo sample.' },
    { name: 'KF-WR-05 (invented)', site: DUMP, depthFromM: 12, depthToM: 15, lithology: 'andesite', totalSulfurPercent: 0.35, sulfideSulfurPercent: null, neutralisationPotential: 55, pastePh: 8.0, modes: [], notes: 'Invented demo sample: sulfide S not analysed, AP from total S (warning).' },
    { name: 'KF-WR-06 (invented)', site: DUMP, depthFromM: 15, depthToM: 18, lithology: 'limestone', totalSulfurPercent: 0.12, sulfideSulfurPercent: 0.08, sulfateSulfurPercent: 0.03, neutralisationPotential: 310, pastePh: 8.6, modes: [{ mineral: 'calcite', weightPercent: 30 }, { mineral: 'dolomite', weightPercent: 5 }, { mineral: 'pyrite', weightPercent: 0.15 }], notes: 'Invented demo sample.' },
    { name: 'KF-WR-07 (invented)', site: DUMP, depthFromM: 18, depthToM: 21, lithology: 'massive sulfide stringer zone', totalSulfurPercent: 3.4, sulfideSulfurPercent: 3.1, sulfateSulfurPercent: 0.25, neutralisationPotential: 6, pastePh: 3.6, modes: [{ mineral: 'pyrite', weightPercent: 5.6 }, { mineral: 'chalcopyrite', weightPercent: 0.3 }], notes: 'Invented demo sample: paste pH below 4, already acid.' },
    { name: 'KF-WR-08 (invented)', site: DUMP, depthFromM: 21, depthToM: 24, lithology: 'andesite', totalSulfurPercent: 0.22, sulfideSulfurPercent: 0.2, sulfateSulfurPercent: 0.02, neutralisationPotential: 22, pastePh: 7.9, modes: [{ mineral: 'pyrite', weightPercent: 0.3 }, { mineral: 'pyrrhotite', weightPercent: 0.1 }, { mineral: 'calcite', weightPercent: 2 }], notes: 'Invented demo sample.' },
  ],
  formulas: [],
};

const BASALT_OXIDES = { SiO2: 48.5, TiO2: 1.6, Al2O3: 15.2, FeOT: 10.9, MnO: 0.17, MgO: 8.9, CaO: 10.4, Na2O: 2.6, K2O: 0.6, P2O5: 0.2, CO2: 0.15 };

const IRONBARK: DemoSiteData = {
  team: 'Ironbark Creek',
  waters: [
    { name: 'IB-RAIN-01 bulk rain (invented)', site: TRIAL, sampledOn: '2026-02-10', temperatureC: 15, pH: 5.6, solutes: mg({ Ca: '0.3', Mg: '0.12', Na: '1.1', K: '0.15', NH4: '0.12', Cl: '1.9', SO4: '0.8', NO3: '0.9', SiO2: '<0.05' }), notes: 'Invented demo analysis: bulk deposition at the trial site. Dilute: judge the CBE with care.' },
    { name: 'IB-LYS-C1 control plot drainage (invented)', site: TRIAL, sampledOn: '2026-04-02', temperatureC: 14.1, pH: 6.4, solutes: mmol({ Ca: '0.4', Mg: '0.15', Na: '0.3', K: '0.05', alkalinity: '0.6', Cl: '0.55', SO4: '0.1', NO3: '0.1', SiO2: '0.12' }), notes: 'Invented demo analysis: lysimeter drainage of the control plot, before basalt.' },
    { name: 'IB-LYS-B1 basalt plot drainage (invented)', site: TRIAL, sampledOn: '2026-04-02', temperatureC: 14.3, pH: 7.1, solutes: mmol({ Ca: '0.55', Mg: '0.6', Na: '0.3', K: '0.05', alkalinity: '1.8', Cl: '0.55', SO4: '0.1', NO3: '0.1', SiO2: '0.42' }), notes: 'Invented demo analysis: lysimeter drainage of the plot that received 50 t/ha crushed basalt.' },
  ],
  models: [
    {
      name: 'Basalt plot drainage from control drainage (invented)',
      description: 'Invented demo model: the added Ca, Mg, Si and alkalinity explained by forsterite, diopside and anorthite dissolving with CO2, and kaolinite forming.',
      initialWater: 'IB-LYS-C1 control plot drainage (invented)',
      finalWater: 'IB-LYS-B1 basalt plot drainage (invented)',
      phases: [
        { name: 'forsterite', speciesId: 'builtin:forsterite', rule: 'dissolve' },
        { name: 'diopside', speciesId: 'builtin:diopside', rule: 'dissolve' },
        { name: 'anorthite', speciesId: 'builtin:anorthite', rule: 'dissolve' },
        { name: 'kaolinite', speciesId: 'builtin:kaolinite', rule: 'precipitate' },
        { name: 'CO2', formula: 'CO2(g)', rule: 'dissolve' },
      ],
      constraints: ['Mg', 'Ca', 'Si', 'Al', 'C'],
      uncertainty: {},
    },
  ],
  rocks: [
    { name: 'IB-BAS-01 crushed basalt feedstock (invented)', site: TRIAL, lithology: 'alkali basalt, crushed < 2 mm', totalSulfurPercent: 0.04, sulfideSulfurPercent: 0.03, neutralisationPotential: 62, pastePh: 9.1, modes: [{ mineral: 'olivine Fo90', formula: 'Mg1.8Fe0.2SiO4', weightPercent: 12 }, { mineral: 'plagioclase An65', formula: 'Na0.35Ca0.65Al1.65Si2.35O8', weightPercent: 45 }, { mineral: 'diopside', formula: 'CaMgSi2O6', weightPercent: 25 }, { mineral: 'calcite', weightPercent: 0.3 }], oxides: BASALT_OXIDES, notes: 'Invented demo sample of the trial feedstock.' },
    { name: 'IB-BAS-02 quarry fines (invented)', site: TRIAL, lithology: 'basalt quarry fines', totalSulfurPercent: 0.11, sulfideSulfurPercent: 0.09, neutralisationPotential: 48, pastePh: 8.7, modes: [{ mineral: 'olivine Fo90', formula: 'Mg1.8Fe0.2SiO4', weightPercent: 8 }, { mineral: 'plagioclase An65', formula: 'Na0.35Ca0.65Al1.65Si2.35O8', weightPercent: 50 }, { mineral: 'diopside', formula: 'CaMgSi2O6', weightPercent: 22 }], oxides: { ...BASALT_OXIDES, MgO: 7.6, CaO: 10.9, CO2: 0.05 }, notes: 'Invented demo sample.' },
  ],
  formulas: [
    {
      name: 'Olivine microprobe IB-OL-07 (invented)',
      sampleName: 'IB-OL-07, basalt feedstock, grain 3 (invented)',
      analysis: { oxides: { SiO2: 40.72, FeO: 9.62, MnO: 0.14, MgO: 49.21, NiO: 0.37, CaO: 0.08 }, group: 'olivine' },
      notes: 'Invented microprobe analysis (about Fo90).',
      reactionSet: 'Basalt field trial weathering (invented scenario)',
      reactionName: 'Olivine IB-OL-07 weathering (invented composition)',
    },
    {
      name: 'Plagioclase microprobe IB-PL-03 (invented)',
      sampleName: 'IB-PL-03, basalt feedstock, phenocryst core (invented)',
      analysis: { oxides: { SiO2: 51.6, Al2O3: 30.7, FeOT: 0.45, CaO: 13.3, Na2O: 3.85, K2O: 0.12 }, group: 'feldspar' },
      notes: 'Invented microprobe analysis (about An65).',
      reactionSet: 'Basalt field trial weathering (invented scenario)',
      reactionName: 'Plagioclase IB-PL-03 to kaolinite (invented composition)',
    },
  ],
};

/** The demo site data of both teams. */
export const DEMO_SITE_DATA: readonly DemoSiteData[] = [KESTREL, IRONBARK];
