import { balanceEquation, balanceToJson, checkEquation, checkToJson, combineReactions, combineToJson, massToJson } from '@tallus/chem';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addReaction, createSet, PUBLISHED } from './support/reaction-sets';
import { createTeam, registerUser, startTestApp, type SignedInUser, type TestApp } from './support/test-app';

let testApp: TestApp;
let owner: SignedInUser;
let teamId: string;

const send = (method: 'get' | 'post' | 'patch' | 'delete', path: string, body?: object) => {
  const test = request(testApp.app)[method](path).set('Authorization', owner.auth);
  return body ? test.send(body) : test;
};
const upload = (targetTeam: string, content: string) =>
  request(testApp.app).post(`/api/teams/${targetTeam}/reaction-sets/import`).set('Authorization', owner.auth).attach('file', Buffer.from(content), 'set.json');
const countRows = async (table: string) => Number((await testApp.orm.em.fork().execute<Array<{ count: string }>>(`select count(*) as count from ${table}`))[0]!.count);

beforeAll(async () => {
  testApp = await startTestApp();
  owner = await registerUser(testApp.app, 'owner');
  teamId = await createTeam(testApp.app, owner, 'Species Team');
});

afterAll(async () => {
  await testApp.close();
});

describe('Species catalogue', () => {
  it('When the plagioclase An38 of Garrels & Mackenzie is added, then its molar mass is computed (268.293 g/mol, check-values §1b)', async () => {
    const created = await send('post', `/api/teams/${teamId}/species`, { name: 'Plagioclase An38', formula: 'Na0.62Ca0.38Al1.38Si2.62O8', phase: 'mineral', source: 'Garrels & Mackenzie 1967' }).expect(201);

    expect(created.body.molarMass).toBeCloseTo(268.293, 2);
    expect(created.body.composition).toMatchObject({ Na: '31/50', Ca: '19/50' });
    const patched = await send('patch', `/api/species/${created.body.id}`, { notes: 'Trial sample', version: created.body.version }).expect(200);
    expect(patched.body.version).toBe(created.body.version + 1);
    expect((await send('patch', `/api/species/${created.body.id}`, { notes: 'stale', version: created.body.version })).body.code).toBe('VERSION_CONFLICT');
    const duplicate = await send('post', `/api/teams/${teamId}/species`, { name: 'Another name', formula: 'Na0.62Ca0.38Al1.38Si2.62O8', phase: 'mineral' });
    expect([duplicate.status, duplicate.body.code]).toEqual([409, 'SPECIES_DUPLICATE']);
    await send('delete', `/api/species/${created.body.id}`).expect(204);
    expect((await send('get', `/api/species/${created.body.id}`)).status).toBe(404);
  });

  it.each([
    ['Ca3(PO4', 'FORMULA_UNBALANCED_PAREN'],
    ['(Mg,Fe)2SiO4', 'FORMULA_MIXED_SITE'],
    ['CaXq', 'FORMULA_UNKNOWN_ELEMENT'],
  ])('When a species formula %s does not parse, then the answer is 422 %s at path formula with a span', async (formula, code) => {
    const response = await send('post', `/api/teams/${teamId}/species`, { name: `Bad ${formula}`, formula, phase: 'mineral' });

    expect(response.status).toBe(422);
    expect(response.body.code).toBe(code);
    expect(response.body.issues[0]).toMatchObject({ code, path: ['formula'], span: { start: expect.any(Number), end: expect.any(Number) } });
  });

  it('When a species is given oxidation states that do not add up to its charge, then the answer is 422 OXIDATION_BAD_STATE at path oxidationStates', async () => {
    const response = await send('post', `/api/teams/${teamId}/species`, { name: 'Odd pyrite', formula: 'FeS2', phase: 'mineral', oxidationStates: { Fe: '3', S: '-1' } });

    expect(response.status).toBe(422);
    expect(response.body.issues[0]).toMatchObject({ code: 'OXIDATION_BAD_STATE', path: ['oxidationStates'] });
  });

  it('When the built-in catalogue is read, then it has at least 40 species, each with a source and a computed molar mass', async () => {
    const builtin = (await send('get', '/api/species/builtin').expect(200)).body as Array<{ formula: string; source: string; molarMass: number; isBuiltin: boolean }>;

    expect(builtin.length).toBeGreaterThanOrEqual(40);
    expect(builtin.every((species) => species.isBuiltin && species.source.length > 0 && species.molarMass > 0)).toBe(true);
    expect(builtin.find((species) => species.formula === 'CaCO3')?.molarMass).toBeCloseTo(100.086, 2);
  });
});

describe('Import and export', () => {
  it('When a set is exported and the file imported again, then the import exports to the same file', async () => {
    const setId = await createSet(testApp.app, owner, teamId, 'Round trip');
    await send('post', `/api/teams/${teamId}/species`, { name: 'Olivine Fo90', formula: 'Mg1.8Fe0.2SiO4', phase: 'mineral', source: 'invented' }).expect(201);
    const first = await addReaction(testApp.app, owner, setId, { name: 'R15', equation: PUBLISHED.pyriteToFerrous, citation: 'Reitner & Thiel 2011' });
    const second = await addReaction(testApp.app, owner, setId, { name: 'R20', equation: PUBLISHED.ferrousToHydroxide });
    await addReaction(testApp.app, owner, setId, { name: 'Fo90', equation: 'Mg1.8Fe0.2SiO4 + H+ -> Mg^2+ + Fe^2+ + H4SiO4', kind: 'dissolution' });
    await send('post', `/api/reaction-sets/${setId}/net-reactions`, { name: 'Net', reactions: [{ reactionId: first.reaction.id }, { reactionId: second.reaction.id, multiplier: '1/4' }], cancel: ['Fe^2+'] }).expect(201);

    const exported = (await send('get', `/api/reaction-sets/${setId}/export?format=json`).expect(200)).body;
    const otherTeam = await createTeam(testApp.app, owner, 'Importing Team');
    const imported = (await upload(otherTeam, JSON.stringify(exported)).expect(201)).body;
    const reexported = (await send('get', `/api/reaction-sets/${imported.id}/export`).expect(200)).body;

    expect({ ...reexported, exportedAt: null }).toEqual({ ...exported, exportedAt: null });
    expect(exported.species).toEqual([expect.objectContaining({ name: 'Olivine Fo90', formula: 'Mg1.8Fe0.2SiO4' })]);
    expect(imported.netReactions[0].result.status).toBe('combined');
    expect(imported.reactions.map((reaction: { result: { status: string } }) => reaction.result.status)).toEqual(['balanced', 'balanced', 'balanced']);
    const csv = (await send('get', `/api/reaction-sets/${setId}/export?format=csv`).expect(200)).text;
    expect(csv.split('\r\n')[0]).toBe('position,name,kind,equation,reference,status,balanced_equation,proton_per_mole,proton_mol_per_kg,electrons_transferred,o2_demand,residuals,citation,notes');
    expect(csv.split('\r\n')[1]).toContain(',balanced,');
  });

  it('When a reaction name or note starts like a spreadsheet formula, then the CSV export prefixes it with a quote, as the site CSVs do', async () => {
    const setId = await createSet(testApp.app, owner, teamId, 'Formula cells');
    await send('post', `/api/reaction-sets/${setId}/reactions`, { name: '=HYPERLINK("http://attacker.test","open")', kind: 'dissolution', equation: PUBLISHED.calcite, notes: '@SUM(1+1)' }).expect(201);

    const response = await send('get', `/api/reaction-sets/${setId}/export?format=csv`).expect(200);
    const row = response.text.split('\r\n')[1]!;

    expect(row).toContain(`,"'=HYPERLINK(""http://attacker.test"",""open"")",`);
    expect(row.endsWith(",'@SUM(1+1)")).toBe(true);
    expect(row).not.toMatch(/,"?[=@]/);
    expect(response.headers['content-disposition']).toContain('Formula-cells.csv');
  });

  it('When a malformed file is imported, then the answer is 400 IMPORT_INVALID with every problem and its path, and nothing is saved', async () => {
    const tables = ['reaction_sets', 'reactions', 'net_reactions', 'species', 'audit_events'];
    const before = await Promise.all(tables.map(countRows));
    const file = {
      format: 'tallus.reaction-set',
      version: 1,
      set: { name: 'Broken' },
      reactions: [{ name: 'ok', kind: 'dissolution', equation: PUBLISHED.calcite }, { name: 'bad', kind: 'melting', equation: 'x' }],
      netReactions: [{ name: 'n', reactions: [{ index: 7 }], cancel: [] }],
      species: [{ name: 'S', formula: 'Ca(OH', phase: 'mineral' }],
    };

    const schemaErrors = await upload(teamId, JSON.stringify(file));
    const laterErrors = await upload(teamId, JSON.stringify({ ...file, reactions: [file.reactions[0]] }));
    const notJson = await upload(teamId, '{"format": ');

    expect([schemaErrors.status, schemaErrors.body.code]).toEqual([400, 'IMPORT_INVALID']);
    expect(schemaErrors.body.issues.map((issue: { path: unknown[] }) => issue.path)).toEqual([['reactions', 1, 'kind']]);
    expect(laterErrors.body.issues.map((issue: { path: unknown[] }) => issue.path)).toEqual([['netReactions', 0, 'reactions', 0, 'index'], ['species', 0, 'formula']]);
    expect(laterErrors.body.issues[1].span).toEqual({ start: expect.any(Number), end: expect.any(Number) });
    expect([notJson.status, notJson.body.code]).toEqual([400, 'IMPORT_INVALID']);
    expect(await Promise.all(tables.map(countRows))).toEqual(before);
  });
});

describe('Stateless chemistry routes', () => {
  it('When balance, check, formula and combine are called, then each answers exactly what the engine (and its command line) prints', async () => {
    const combineInput = { reactions: [{ equation: PUBLISHED.pyriteToFerrous }, { equation: PUBLISHED.ferrousToHydroxide, multiplier: '1/4' }], cancel: ['Fe^2+'] };

    const balance = await send('post', '/api/chem/balance', { equation: 'FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', normalizeTo: 'FeS2' }).expect(200);
    const check = await send('post', '/api/chem/check', { equation: PUBLISHED.forsterite, rockWeightPercent: 10 }).expect(200);
    const formula = await send('post', '/api/chem/formula', { formula: 'CaMg(CO3)2' }).expect(200);
    const combine = await send('post', '/api/chem/combine', combineInput).expect(200);

    expect(balance.body).toEqual(JSON.parse(JSON.stringify(balanceToJson(balanceEquation('FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', { normalizeTo: 'FeS2' })))));
    expect(balance.body.equation).toBe('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
    expect(check.body).toEqual(JSON.parse(JSON.stringify(checkToJson(checkEquation(PUBLISHED.forsterite, { rockWeightPercent: 10 })))));
    expect(check.body.protonBudget.perMole).toBe('-4');
    expect(formula.body).toEqual(massToJson('CaMg(CO3)2'));
    expect(formula.body.molarMass).toBeCloseTo(184.399, 2);
    expect(combine.body).toEqual(JSON.parse(JSON.stringify(combineToJson(combineReactions(combineInput)))));
  });

  it('When text does not parse, then balance answers 200 invalid with a span and formula answers 422 at path formula', async () => {
    const balance = await send('post', '/api/chem/balance', { equation: 'H2 + O2' }).expect(200);
    const formula = await send('post', '/api/chem/formula', { formula: 'Ca3(PO4' });

    expect(balance.body).toMatchObject({ status: 'invalid', error: { code: 'EQUATION_NO_ARROW' } });
    expect([formula.status, formula.body.issues[0].path]).toEqual([422, ['formula']]);
  });

  it('When one user exceeds the per-minute computation limit, then the answer is 429 CHEM_RATE_LIMITED', async () => {
    const limited = await startTestApp({ CHEM_RATE_LIMIT_PER_MINUTE: '2' });
    const user = await registerUser(limited.app, 'busy');
    const statuses: number[] = [];
    for (let index = 0; index < 3; index++) {
      statuses.push((await request(limited.app).post('/api/chem/formula').set('Authorization', user.auth).send({ formula: 'H2O' })).status);
    }
    const last = await request(limited.app).post('/api/chem/formula').set('Authorization', user.auth).send({ formula: 'H2O' });
    await limited.close();

    expect(statuses).toEqual([200, 200, 429]);
    expect(last.body.code).toBe('CHEM_RATE_LIMITED');
  });
});
