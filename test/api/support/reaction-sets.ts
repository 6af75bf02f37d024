import type { Express } from 'express';
import request from 'supertest';
import type { SignedInUser } from './test-app';

/** Published reactions the API specs use, with their sources (shared/reference/check-values.md §2). */
export const PUBLISHED = {
  /** R15: pyrite by O2 to Fe2+, +2 H+ (Reitner & Thiel 2011, Encyclopedia of Geobiology, "Pyrite oxidation"). */
  pyriteToFerrous: 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+',
  /** R20: Fe2+ oxidation and hydrolysis, +8 H+ (Andrews et al., An Introduction to Environmental Chemistry, eq. 5.16). */
  ferrousToHydroxide: '4 Fe^2+ + O2 + 10 H2O -> 4 Fe(OH)3 + 8 H+',
  /** R21b: calcite neutralisation, −1 H+ (Itasca Denver report to Colorado DRMS, eq. 3.3). */
  calcite: 'CaCO3 + H+ -> Ca^2+ + HCO3-',
  /** R13: forsterite, congruent, −4 H+ (check-values R13; Pokrovsky & Schott 2000, GCA). */
  forsterite: 'Mg2SiO4 + 4 H+ -> 2 Mg^2+ + H4SiO4',
} as const;

/** Creates a reaction set through the API and returns its id. */
export async function createSet(app: Express, user: SignedInUser, teamId: string, name = 'Test set'): Promise<string> {
  const response = await request(app).post(`/api/teams/${teamId}/reaction-sets`).set('Authorization', user.auth).send({ name, site: 'Test site' }).expect(201);
  return (response.body as { id: string }).id;
}

/** Adds a reaction through the API and returns the whole answer body. */
export async function addReaction(
  app: Express,
  user: SignedInUser,
  setId: string,
  fields: { name: string; equation: string; kind?: string; reference?: string | null; citation?: string },
): Promise<{ reaction: { id: string; version: number; result: Record<string, unknown> }; set: { version: number; reviewState: string } }> {
  const response = await request(app)
    .post(`/api/reaction-sets/${setId}/reactions`)
    .set('Authorization', user.auth)
    .send({ kind: 'oxidation', ...fields })
    .expect(201);
  return response.body;
}
