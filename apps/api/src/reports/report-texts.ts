import { ABA_NOTES, CO2_CAUTIONS, DEFAULT_NPR_BANDS, SIDERITE_CAUTION } from '@tallus/chem';

/** The cautions every report carries (DESIGN.md §5), in the engine's words where it has them. */
export const REPORT_CAUTIONS = [
  'This report is a screening estimate. It is not a substitute for kinetic testing, site investigation, local regulation or a licensed professional\'s judgement.',
  ABA_NOTES.SCREENING_ONLY,
  SIDERITE_CAUTION,
  CO2_CAUTIONS.THEORETICAL,
  CO2_CAUTIONS.NON_CARBONIC_ACID,
  CO2_CAUTIONS.OCEAN_EFFICIENCY,
] as const;

/** Assumptions common to every report. */
export const REPORT_ASSUMPTIONS = [
  'Every balance, budget, net reaction and mass-balance transfer was recomputed by the server with Tallus\'s exact rational engine; nothing typed by a user is trusted as a result.',
  'Molar masses use the IUPAC 2021 abridged standard atomic weights (Prohaska et al. 2022).',
  'Proton budgets are net H+ produced (+) or consumed (−) per mole of the reaction\'s reference species; kg CaCO3 equivalents assume 2 H+ per CaCO3 (CO2 end point) unless stated.',
  'Oxidation states follow the usual rules or the species catalogue where the rules cannot decide (e.g. pyrite Fe +2, S −1).',
] as const;

/** The references the reports cite. */
export const REPORT_REFERENCES = [
  'Prohaska, T. et al. (2022) Standard atomic weights of the elements 2021 (IUPAC Technical Report). Pure Appl. Chem. 94(5), 573–600.',
  'Sobek, A.A., Schuller, W.A., Freeman, J.R. & Smith, R.M. (1978) Field and laboratory methods applicable to overburdens and minesoils. EPA-600/2-78-054.',
  `NPR screening bands: ${DEFAULT_NPR_BANDS.source}`,
  'Dold, B. (2017) Acid rock drainage prediction: a critical review. J. Geochem. Explor. 172, 120–132 (bicarbonate end point, factor 62.5).',
  'Skousen, J. et al. (1997) on siderite and the overestimate of NP by standard methods.',
  'Droop, G.T.R. (1987) A general equation for estimating Fe3+ concentrations in ferromagnesian silicates and oxides from microprobe analyses, using stoichiometric criteria. Mineral. Mag. 51, 431–435.',
  'Brady, J.B. & Perkins, D., Mineral formulae recalculation (SERC, Carleton College).',
  'Renforth, P. (2019) The negative emission potential of alkaline materials. Nat. Commun. 10, 1401 (oxide CO2 potential, recalled from memory).',
  'Garrels, R.M. & Mackenzie, F.T. (1967) Origin of the chemical compositions of some springs and lakes. Adv. Chem. Ser. 67, 222–242 (inverse mass balance).',
  'Charge-balance acceptance ±5 %: laboratory QA practice (Marshall Miller & Associates; Colorado DRMS); DVWK 128/92 as described by Wilke for the half-sum convention.',
  'CarbonPlan CDR Verification Framework (CO2 uptake is a theoretical maximum, not a verified removal).',
] as const;
