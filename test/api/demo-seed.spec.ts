import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_TEAMS } from '../../apps/api/src/db/seeders/demo-accounts';
import { seedDemo } from '../../apps/api/src/db/seeders/demo-seeder';
import { startTestApp, type TestApp } from './support/test-app';

/** Row counts of the demo's users, their memberships and their teams. */
async function countDemoRows(testApp: TestApp) {
  const emails = DEMO_ACCOUNTS.map((account) => account.email);
  const [row] = await testApp.orm.em.fork().getConnection().execute(
    `select (select count(*)::int from users where email in (${emails.map(() => '?').join(',')})) as users,
            (select count(*)::int from memberships m join users u on u.id = m.user_id where u.email in (${emails.map(() => '?').join(',')})) as memberships,
            (select count(distinct m.team_id)::int from memberships m join users u on u.id = m.user_id where u.email in (${emails.map(() => '?').join(',')})) as teams`,
    [...emails, ...emails, ...emails],
  );
  return row as { users: number; memberships: number; teams: number };
}

describe('The demo seeder', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('When the seeder runs twice, then the second run adds nothing and nothing is lost', async () => {
    await seedDemo(testApp.orm.em, 10);
    const afterFirst = await countDemoRows(testApp);

    const second = await seedDemo(testApp.orm.em, 10);

    expect(second).toEqual({ usersCreated: 0, teamsCreated: 0, membershipsCreated: 0, reactionSetsCreated: 0, siteRecordsCreated: 0 });
    expect(afterFirst).toEqual({ users: 8, memberships: 8, teams: 2 });
    expect(await countDemoRows(testApp)).toEqual(afterFirst);
  });

  it('When a demo user signs in, then Kestrel Flats has a vetted, published set and one under review, and Ironbark Creek a draft, all computed', async () => {
    await seedDemo(testApp.orm.em, 10);
    const signIn = async (email: string) =>
      `Bearer ${(await request(testApp.app).post('/api/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200)).body.token}`;
    const kestrel = await signIn('viewer@kestrel.example');
    const ironbark = await signIn('viewer@ironbark.example');
    const teamOf = async (auth: string) => (await request(testApp.app).get('/api/auth/me').set('Authorization', auth)).body.memberships[0].teamId;

    const kestrelSets = (await request(testApp.app).get(`/api/teams/${await teamOf(kestrel)}/reaction-sets`).set('Authorization', kestrel).expect(200)).body;
    const ironbarkSets = (await request(testApp.app).get(`/api/teams/${await teamOf(ironbark)}/reaction-sets`).set('Authorization', ironbark).expect(200)).body;
    const library = (await request(testApp.app).get('/api/library').set('Authorization', ironbark).expect(200)).body;

    const states = (sets: Array<{ name: string; reviewState: string }>) => Object.fromEntries(sets.map((set) => [set.name, set.reviewState]));
    // Containing, not equal: other specs in this run (or a demo walk-through) may add sets to the demo teams.
    expect(states(kestrelSets)).toMatchObject({
      'Waste-rock sulfide oxidation (invented scenario)': 'vetted',
      'Tailings pore-water neutralisation (invented scenario)': 'in_review',
    });
    expect(states(ironbarkSets)).toMatchObject({ 'Basalt field trial weathering (invented scenario)': 'draft' });
    const demoSets = [...kestrelSets, ...ironbarkSets].filter((set: { name: string }) => set.name.endsWith('(invented scenario)'));
    expect(demoSets).toHaveLength(3);
    expect(demoSets.every((set: { statusCounts: { balanced: number }; reactionCount: number }) => set.statusCounts.balanced === set.reactionCount)).toBe(true);
    expect(library).toContainEqual(expect.objectContaining({ teamName: 'Kestrel Flats', setName: 'Waste-rock sulfide oxidation (invented scenario)', revision: 1 }));
    const wasteRock = kestrelSets.find((set: { reviewState: string }) => set.reviewState === 'vetted');
    const detail = (await request(testApp.app).get(`/api/reaction-sets/${wasteRock.id}`).set('Authorization', kestrel).expect(200)).body;
    expect(detail.netReactions[0].result).toMatchObject({ status: 'combined', protonBudget: { perMole: '4' } });
  });

  it('When the demo has been changed, then seeding again keeps the change (a promoted viewer stays promoted)', async () => {
    await seedDemo(testApp.orm.em, 10);
    await testApp.orm.em
      .fork()
      .getConnection()
      .execute("update memberships set role = 'editor' where user_id = (select id from users where email = 'viewer@ironbark.example')");

    await seedDemo(testApp.orm.em, 10);
    const login = await request(testApp.app).post('/api/auth/login').send({ email: 'viewer@ironbark.example', password: DEMO_PASSWORD });
    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', `Bearer ${login.body.token}`);

    expect(me.body.memberships).toEqual([{ teamId: expect.any(String), teamName: 'Ironbark Creek', role: 'editor' }]);
    await testApp.orm.em
      .fork()
      .getConnection()
      .execute("update memberships set role = 'viewer' where user_id = (select id from users where email = 'viewer@ironbark.example')");
  });

  it.each(DEMO_ACCOUNTS.map((account) => [account.email, account.team, account.role] as const))(
    'When %s signs in with the demo password, then they are in %s as %s',
    async (email, team, role) => {
      await seedDemo(testApp.orm.em, 10);

      const login = await request(testApp.app).post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
      const me = await request(testApp.app).get('/api/auth/me').set('Authorization', `Bearer ${login.body.token}`);

      expect(login.status).toBe(200);
      expect(me.body.memberships).toEqual([{ teamId: expect.any(String), teamName: team, role }]);
    },
  );

  it('When the demo data is listed, then there are two invented teams with one account per role each and a password of 10+ characters', () => {
    expect(DEMO_TEAMS.map((team) => team.name)).toEqual(['Kestrel Flats', 'Ironbark Creek']);
    for (const team of DEMO_TEAMS) {
      expect(DEMO_ACCOUNTS.filter((account) => account.team === team.name).map((account) => account.role)).toEqual(['owner', 'reviewer', 'editor', 'viewer']);
    }
    expect(DEMO_PASSWORD.length).toBeGreaterThanOrEqual(10);
  });
});
