/** One section of a team's workspace, as the shell's navigation lists it. */
export interface TeamSection {
  /** Path below `/teams/:teamId`; empty for the team's overview. */
  path: string;
  label: string;
  icon: string;
}

/** The sections of a team, in navigation order. Later features add theirs here. */
export const TEAM_SECTIONS: readonly TeamSection[] = [
  { path: '', label: 'Reaction sets', icon: 'science' },
  { path: 'species', label: 'Species catalogue', icon: 'hexagon' },
  { path: 'library', label: 'Library', icon: 'local_library' },
  { path: 'water-analyses', label: 'Water analyses', icon: 'water_drop' },
  { path: 'mass-balance', label: 'Mass balance', icon: 'account_tree' },
  { path: 'rock-samples', label: 'Rock samples', icon: 'landslide' },
  { path: 'mineral-formulas', label: 'Mineral formulas', icon: 'diamond' },
  { path: 'reports', label: 'Reports', icon: 'picture_as_pdf' },
  { path: 'members', label: 'Members', icon: 'group' },
];
