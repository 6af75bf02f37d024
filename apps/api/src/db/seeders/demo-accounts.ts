import type { Role } from '@tallus/contracts';

/**
 * The invented demo scenario of DESIGN.md §6. Every team, place and person
 * here is fictional; e-mail addresses use the reserved `.example` domain.
 */

/** The one password of every demo account (only for local demos). */
export const DEMO_PASSWORD = 'tallus-demo-2026';

/** A fictional team of the demo. */
export interface DemoTeam {
  name: string;
  /** One line on who they are and what they study (invented). */
  summary: string;
}

/** The two fictional teams. */
export const DEMO_TEAMS: readonly DemoTeam[] = [
  {
    name: 'Kestrel Flats',
    summary: 'Invented consultancy studying the tailings facility of the made-up Tarnwick Hill mine, with sulfide-bearing waste rock.',
  },
  {
    name: 'Ironbark Creek',
    summary: 'Invented research group running a made-up basalt field trial for enhanced rock weathering.',
  },
];

/** One demo sign-in. */
export interface DemoAccount {
  /** Name of the team in {@link DEMO_TEAMS}. */
  team: string;
  role: Role;
  email: string;
  displayName: string;
}

/** Four accounts per team, one for each role; all use {@link DEMO_PASSWORD}. */
export const DEMO_ACCOUNTS: readonly DemoAccount[] = [
  { team: 'Kestrel Flats', role: 'owner', email: 'owner@kestrel.example', displayName: 'Imogen Vale' },
  { team: 'Kestrel Flats', role: 'reviewer', email: 'reviewer@kestrel.example', displayName: 'Tomasz Reyes' },
  { team: 'Kestrel Flats', role: 'editor', email: 'editor@kestrel.example', displayName: 'Aroha Lindqvist' },
  { team: 'Kestrel Flats', role: 'viewer', email: 'viewer@kestrel.example', displayName: 'Felix Mbeki' },
  { team: 'Ironbark Creek', role: 'owner', email: 'owner@ironbark.example', displayName: 'Priya Castellanos' },
  { team: 'Ironbark Creek', role: 'reviewer', email: 'reviewer@ironbark.example', displayName: 'Jonah Whitcombe' },
  { team: 'Ironbark Creek', role: 'editor', email: 'editor@ironbark.example', displayName: 'Ines Haddad' },
  { team: 'Ironbark Creek', role: 'viewer', email: 'viewer@ironbark.example', displayName: 'Callum Ferreira' },
];
