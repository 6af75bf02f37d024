/** One section of a team's workspace, as the shell's navigation lists it. */
export interface TeamSection {
  /** Path below `/teams/:teamId`; empty for the team's overview. */
  path: string;
  label: string;
  icon: string;
}

/** The sections of a team, in navigation order. Later features add theirs here. */
export const TEAM_SECTIONS: readonly TeamSection[] = [
  { path: '', label: 'Overview', icon: 'space_dashboard' },
  { path: 'members', label: 'Members', icon: 'group' },
];
