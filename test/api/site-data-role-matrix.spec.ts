import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSet } from './support/reaction-sets';
import { mmolWater, uploadCsv } from './support/site-data';
import { enrolMatrixTeam, expectMatrixAnswer, matrixCases, type Actor } from './support/role-matrix';
import { startTestApp, type SignedInUser, type TestApp } from './support/test-app';


let testApp: TestApp;
const actors = {} as Record<Actor, SignedInUser>;
/** An editor who arranges the records the actors act on. */
let author: SignedInUser;
let teamId: string;
let counter = 0;

const app = () => testApp.app;
const unique = (label: string) => `${label} ${++counter}-${crypto.randomUUID().slice(0, 8)}`;
const call = (method: 'get' | 'post' | 'patch' | 'delete', path: string, actor: SignedInUser, body?: object) => {
  const test = request(app())[method](path).set('Authorization', actor.auth);
  return body ? test.send(body) : test;
};

async function water(): Promise<{ id: string; version: number }> {
  return (await call('post', `/api/teams/${teamId}/water-analyses`, author, mmolWater(unique('Well'), { Ca: '1', HCO3: '2' })).expect(201)).body;
}

async function model(): Promise<{ id: string; version: number }> {
  const final = await water();
  const body = { name: unique('Model'), initialWaterId: null, finalWaterId: final.id, phases: [{ name: 'calcite', formula: 'CaCO3' }, { name: 'CO2', formula: 'CO2(g)' }], constraints: ['Ca', 'C'] };
  return (await call('post', `/api/teams/${teamId}/mass-balance-models`, author, body).expect(201)).body;
}

async function rock(): Promise<{ id: string; version: number }> {
  return (await call('post', `/api/teams/${teamId}/rock-samples`, author, { name: unique('Rock'), sulfideSulfurPercent: 1, neutralisationPotential: 20 }).expect(201)).body;
}

const waterCsv = () => `sample,Ca (mg/L)\n${unique('CSV well')},40\n`;
const rockCsv = () => `sample,total_s_pct,np_kg_caco3_t\n${unique('CSV rock')},1,10\n`;
const olivine = { oxides: { MgO: 49.35217246375826, FeO: 9.774760372519541, SiO2: 40.873067163722204 }, group: 'olivine' };

/** Each new route: how to call it as an actor, after arranging what it needs. */
const ROUTES: Record<string, (actor: SignedInUser) => Promise<request.Response>> = {
  'GET /teams/:teamId/settings': (actor) => call('get', `/api/teams/${teamId}/settings`, actor),
  'PATCH /teams/:teamId/settings': async (actor) => {
    const { version } = (await call('get', `/api/teams/${teamId}/settings`, author)).body;
    return call('patch', `/api/teams/${teamId}/settings`, actor, { cbeThresholdPercent: 5, version });
  },
  'GET /teams/:teamId/water-analyses': (actor) => call('get', `/api/teams/${teamId}/water-analyses`, actor),
  'POST /teams/:teamId/water-analyses': (actor) => call('post', `/api/teams/${teamId}/water-analyses`, actor, mmolWater(unique('New well'), { Na: '1', Cl: '1' })),
  'GET /teams/:teamId/water-analyses/export.csv': (actor) => call('get', `/api/teams/${teamId}/water-analyses/export.csv`, actor),
  'GET /teams/:teamId/water-analyses/template.csv': (actor) => call('get', `/api/teams/${teamId}/water-analyses/template.csv`, actor),
  'POST /teams/:teamId/water-analyses/import/preview': (actor) => uploadCsv(app(), actor, `/api/teams/${teamId}/water-analyses/import/preview`, waterCsv()),
  'POST /teams/:teamId/water-analyses/import': (actor) => uploadCsv(app(), actor, `/api/teams/${teamId}/water-analyses/import`, waterCsv()),
  'GET /water-analyses/:id': async (actor) => call('get', `/api/water-analyses/${(await water()).id}`, actor),
  'PATCH /water-analyses/:id': async (actor) => {
    const { id, version } = await water();
    return call('patch', `/api/water-analyses/${id}`, actor, { site: 'Well field', version });
  },
  'DELETE /water-analyses/:id': async (actor) => call('delete', `/api/water-analyses/${(await water()).id}`, actor),
  'GET /teams/:teamId/mass-balance-models': (actor) => call('get', `/api/teams/${teamId}/mass-balance-models`, actor),
  'POST /teams/:teamId/mass-balance-models': async (actor) => {
    const final = await water();
    return call('post', `/api/teams/${teamId}/mass-balance-models`, actor, { name: unique('M'), initialWaterId: null, finalWaterId: final.id, phases: [{ name: 'calcite', formula: 'CaCO3' }], constraints: ['Ca'] });
  },
  'GET /teams/:teamId/mass-balance-models/export.csv': (actor) => call('get', `/api/teams/${teamId}/mass-balance-models/export.csv`, actor),
  'GET /mass-balance-models/:id': async (actor) => call('get', `/api/mass-balance-models/${(await model()).id}`, actor),
  'GET /mass-balance-models/:id/models.csv': async (actor) => call('get', `/api/mass-balance-models/${(await model()).id}/models.csv`, actor),
  'PATCH /mass-balance-models/:id': async (actor) => {
    const { id, version } = await model();
    return call('patch', `/api/mass-balance-models/${id}`, actor, { description: 'checked', version });
  },
  'POST /mass-balance-models/:id/solve': async (actor) => call('post', `/api/mass-balance-models/${(await model()).id}/solve`, actor),
  'DELETE /mass-balance-models/:id': async (actor) => call('delete', `/api/mass-balance-models/${(await model()).id}`, actor),
  'GET /teams/:teamId/rock-samples': (actor) => call('get', `/api/teams/${teamId}/rock-samples`, actor),
  'POST /teams/:teamId/rock-samples': (actor) => call('post', `/api/teams/${teamId}/rock-samples`, actor, { name: unique('New rock'), totalSulfurPercent: 0.5, neutralisationPotential: 10 }),
  'GET /teams/:teamId/rock-samples/export.csv': (actor) => call('get', `/api/teams/${teamId}/rock-samples/export.csv`, actor),
  'GET /teams/:teamId/rock-samples/template.csv': (actor) => call('get', `/api/teams/${teamId}/rock-samples/template.csv`, actor),
  'POST /teams/:teamId/rock-samples/import/preview': (actor) => uploadCsv(app(), actor, `/api/teams/${teamId}/rock-samples/import/preview`, rockCsv()),
  'POST /teams/:teamId/rock-samples/import': (actor) => uploadCsv(app(), actor, `/api/teams/${teamId}/rock-samples/import`, rockCsv()),
  'GET /rock-samples/:id': async (actor) => call('get', `/api/rock-samples/${(await rock()).id}`, actor),
  'PATCH /rock-samples/:id': async (actor) => {
    const { id, version } = await rock();
    return call('patch', `/api/rock-samples/${id}`, actor, { pastePh: 6.5, version });
  },
  'DELETE /rock-samples/:id': async (actor) => call('delete', `/api/rock-samples/${(await rock()).id}`, actor),
  'POST /teams/:teamId/mineral-formulas/recalculate': (actor) => call('post', `/api/teams/${teamId}/mineral-formulas/recalculate`, actor, { analysis: olivine }),
  'GET /teams/:teamId/mineral-formulas': (actor) => call('get', `/api/teams/${teamId}/mineral-formulas`, actor),
  'POST /teams/:teamId/mineral-formulas': (actor) =>
    call('post', `/api/teams/${teamId}/mineral-formulas`, actor, { analysis: { ...olivine, oxides: { ...olivine.oxides, NiO: 0.2 * ++counter } }, name: unique('Olivine') }),
  'GET /teams/:teamId/mineral-formulas/export.csv': (actor) => call('get', `/api/teams/${teamId}/mineral-formulas/export.csv`, actor),
  'GET /reaction-sets/:id/report.pdf': async (actor) => call('get', `/api/reaction-sets/${await createSet(app(), author, teamId, unique('Report set'))}/report.pdf`, actor),
  'GET /teams/:teamId/site-report.pdf': (actor) => call('get', `/api/teams/${teamId}/site-report.pdf?site=Test%20site`, actor),
  'GET /teams/:teamId/sites': (actor) => call('get', `/api/teams/${teamId}/sites`, actor),
  'POST /chem/oxides': (actor) => call('post', '/api/chem/oxides', actor, olivine),
  'POST /chem/co2': (actor) => call('post', '/api/chem/co2', actor, { formula: 'Mg2SiO4' }),
  'POST /chem/mass-balance': (actor) => call('post', '/api/chem/mass-balance', actor, { initial: {}, final: { Ca: 1 }, phases: [{ name: 'lime', formula: 'CaO' }], constraints: ['Ca'] }),
};

const READ = { owner: 200, reviewer: 200, editor: 200, viewer: 200, outsider: 404 };
const ANYONE = { owner: 200, reviewer: 200, editor: 200, viewer: 200, outsider: 200 };
const write = (status: number) => ({ owner: status, reviewer: status, editor: status, viewer: 403, outsider: 404 });

/** Expected status per route and actor (DESIGN.md §5: viewers read, editors write, owners change team settings). */
const MATRIX: Record<keyof typeof ROUTES, Record<Actor, number>> = {
  'GET /teams/:teamId/settings': READ,
  'PATCH /teams/:teamId/settings': { owner: 200, reviewer: 403, editor: 403, viewer: 403, outsider: 404 },
  'GET /teams/:teamId/water-analyses': READ,
  'POST /teams/:teamId/water-analyses': write(201),
  'GET /teams/:teamId/water-analyses/export.csv': READ,
  'GET /teams/:teamId/water-analyses/template.csv': READ,
  'POST /teams/:teamId/water-analyses/import/preview': write(200),
  'POST /teams/:teamId/water-analyses/import': write(201),
  'GET /water-analyses/:id': READ,
  'PATCH /water-analyses/:id': write(200),
  'DELETE /water-analyses/:id': write(204),
  'GET /teams/:teamId/mass-balance-models': READ,
  'POST /teams/:teamId/mass-balance-models': write(201),
  'GET /teams/:teamId/mass-balance-models/export.csv': READ,
  'GET /mass-balance-models/:id': READ,
  'GET /mass-balance-models/:id/models.csv': READ,
  'PATCH /mass-balance-models/:id': write(200),
  'POST /mass-balance-models/:id/solve': write(200),
  'DELETE /mass-balance-models/:id': write(204),
  'GET /teams/:teamId/rock-samples': READ,
  'POST /teams/:teamId/rock-samples': write(201),
  'GET /teams/:teamId/rock-samples/export.csv': READ,
  'GET /teams/:teamId/rock-samples/template.csv': READ,
  'POST /teams/:teamId/rock-samples/import/preview': write(200),
  'POST /teams/:teamId/rock-samples/import': write(201),
  'GET /rock-samples/:id': READ,
  'PATCH /rock-samples/:id': write(200),
  'DELETE /rock-samples/:id': write(204),
  'POST /teams/:teamId/mineral-formulas/recalculate': READ,
  'GET /teams/:teamId/mineral-formulas': READ,
  'POST /teams/:teamId/mineral-formulas': write(201),
  'GET /teams/:teamId/mineral-formulas/export.csv': READ,
  'GET /reaction-sets/:id/report.pdf': READ,
  'GET /teams/:teamId/site-report.pdf': READ,
  'GET /teams/:teamId/sites': READ,
  'POST /chem/oxides': ANYONE,
  'POST /chem/co2': ANYONE,
  'POST /chem/mass-balance': ANYONE,
};

const CASES = matrixCases(MATRIX);

describe('Site-data, report and site-chemistry routes by role', () => {
  beforeAll(async () => {
    testApp = await startTestApp();
    ({ teamId, author } = await enrolMatrixTeam(testApp, actors, 'Site Matrix Team'));
  });

  afterAll(async () => {
    await testApp.close();
  });

  it.each(CASES)('When %s is called by the %s, then the status is %i', async (route, actor, status) => {
    const response = await ROUTES[route]!(actors[actor]);

    expectMatrixAnswer(response, status);
  });

  it('When an outsider asks for an existing water analysis and a missing one, then both answers are identical', async () => {
    const existing = await call('get', `/api/water-analyses/${(await water()).id}`, actors.outsider);
    const missing = await call('get', `/api/water-analyses/${crypto.randomUUID()}`, actors.outsider);

    expect(existing.status).toBe(404);
    expect(existing.body).toEqual(missing.body);
  });

  it('When a new route is called without a token, then the answer is 401', async () => {
    const paths = [`/api/teams/${teamId}/water-analyses`, `/api/teams/${teamId}/rock-samples`, `/api/teams/${teamId}/settings`, `/api/teams/${teamId}/site-report.pdf`];
    const responses = await Promise.all(paths.map((path) => request(app()).get(path)));

    expect(responses.map((response) => response.status)).toEqual([401, 401, 401, 401]);
  });
});
