import type { MassBalanceModel } from '@tallus/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mmolWater, saveWater, uploadCsv } from './support/site-data';
import { addMember, createTeam, registerUser, startTestApp, type SignedInUser, type TestApp } from './support/test-app';

let testApp: TestApp;
let owner: SignedInUser;
let editor: SignedInUser;
let teamId: string;

const app = () => testApp.app;
const saveModel = async (body: object) => (await request(app()).post(`/api/teams/${teamId}/mass-balance-models`).set('Authorization', editor.auth).send(body).expect(201)).body as MassBalanceModel;
const waterCount = async () => (await request(app()).get(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).expect(200)).body.length as number;

beforeAll(async () => {
  testApp = await startTestApp();
  owner = await registerUser(app(), 'mb-owner');
  editor = await registerUser(app(), 'mb-editor');
  teamId = await createTeam(app(), owner, 'Mass-balance team');
  await addMember(testApp, teamId, editor, 'editor');
});

afterAll(async () => {
  await testApp.close();
});

describe('mass-balance models', () => {
  it('When a final water is made forward from chosen transfers, then solving through the API recovers them exactly, with the implied net reaction and the mmol/L ≈ mmol/kg assumption', async () => {
    // Chosen (mmol/kg): calcite 1/4, gypsum 3/20, dolomite 1/20, halite 1/10, CO2 7/20.
    const initial = await saveWater(app(), editor, teamId, mmolWater('Forward initial', { Ca: '0.5', Mg: '0.2', Na: '0.3', Cl: '0.3', SO4: '0.1', HCO3: '1.2' }));
    const final = await saveWater(app(), editor, teamId, mmolWater('Forward final', { Ca: '0.95', Mg: '0.25', Na: '0.4', Cl: '0.4', SO4: '0.25', HCO3: '1.9' }));

    const model = await saveModel({
      name: 'Forward then inverse',
      initialWaterId: initial.id,
      finalWaterId: final.id,
      phases: [
        { name: 'calcite', speciesId: 'builtin:calcite', rule: 'dissolve' },
        { name: 'gypsum', speciesId: 'builtin:gypsum', rule: 'dissolve' },
        { name: 'dolomite', formula: 'CaMg(CO3)2', rule: 'dissolve' },
        { name: 'halite', formula: 'NaCl', rule: 'dissolve' },
        { name: 'CO2', formula: 'CO2(g)', rule: 'either' },
      ],
      constraints: ['Ca', 'Mg', 'Na', 'Cl', 'S', 'C'],
    });

    expect(model.result.status).toBe('exact');
    expect(model.result.models).toHaveLength(1);
    expect(model.result.models[0]).toMatchObject({ valid: true, transfers: { calcite: '1/4', gypsum: '3/20', dolomite: '1/20', halite: '1/10', CO2: '7/20' } });
    expect(model.result.models[0].impliedReaction.status).toBe('balanced');
    expect(model.phases[0]).toMatchObject({ speciesId: 'builtin:calcite', formula: 'CaCO3' });
    expect(model.result.assumptions[0]).toContain('mmol/L');
  });

  it('When the Garrels & Mackenzie (1967) snow and ephemeral-spring waters are balanced by plagioclase An38, biotite, K-feldspar and kaolinite, then the transfers match the published balance sheet (177, 7.3, 12.7, −132 µmol/kg)', async () => {
    // shared/reference/check-values.md §5a: compositions in µmol/L (from memory of Feth et al. 1964 as averaged by G&M); square system Na, Mg, K, Al.
    const micro = (values: Record<string, string>) => Object.fromEntries(Object.entries(values).map(([key, value]) => [key, { value, unit: 'µmol/L' }]));
    const snow = await saveWater(app(), editor, teamId, { name: 'G&M snow', solutes: micro({ Na: '24', Ca: '10', Mg: '7', K: '8', HCO3: '18', SO4: '10', Cl: '14', SiO2: '3' }) });
    const spring = await saveWater(app(), editor, teamId, { name: 'G&M ephemeral springs', solutes: micro({ Na: '134', Ca: '78', Mg: '29', K: '28', HCO3: '328', SO4: '10', Cl: '14', SiO2: '273' }) });

    const model = await saveModel({
      name: 'Sierra Nevada springs',
      initialWaterId: snow.id,
      finalWaterId: spring.id,
      phases: [
        { name: 'plagioclase', formula: 'Na0.62Ca0.38Al1.38Si2.62O8', rule: 'dissolve' },
        { name: 'biotite', formula: 'KMg3AlSi3O10(OH)2', rule: 'dissolve' },
        { name: 'K-feldspar', speciesId: 'builtin:k-feldspar', rule: 'dissolve' },
        { name: 'kaolinite', speciesId: 'builtin:kaolinite', rule: 'precipitate' },
      ],
      constraints: ['Na', 'Mg', 'K', 'Al'],
    });

    const transfers = model.result.models[0].transfers;
    expect(transfers).toEqual({ plagioclase: '11/62', biotite: '11/1500', 'K-feldspar': '19/1500', kaolinite: '-821/6200' });
    expect(model.result.models[0].transfersDecimal.plagioclase * 1000).toBeCloseTo(177, 0);
    expect(model.result.models[0].transfersDecimal.biotite * 1000).toBeCloseTo(7.3, 1);
    expect(model.result.models[0].transfersDecimal['K-feldspar'] * 1000).toBeCloseTo(12.7, 1);
    expect(model.result.models[0].transfersDecimal.kaolinite * 1000).toBeCloseTo(-132, 0);
    expect(model.result.initial.mmolPerKg.Na).toBe('0.024');
  });

  it('When a water is changed, then the models using it are solved again; it cannot be deleted while used (409), and the models table exports as CSV', async () => {
    const initial = await saveWater(app(), editor, teamId, mmolWater('Calcite initial', { Ca: '1', HCO3: '2' }));
    const final = await saveWater(app(), editor, teamId, mmolWater('Calcite final', { Ca: '2', HCO3: '4' }));
    const model = await saveModel({ name: 'Calcite', initialWaterId: initial.id, finalWaterId: final.id, phases: [{ name: 'calcite', formula: 'CaCO3', rule: 'dissolve' }, { name: 'CO2', formula: 'CO2(g)' }], constraints: ['Ca', 'C'] });
    expect(model.result.models[0].transfers).toEqual({ calcite: '1', CO2: '1' });

    await request(app()).patch(`/api/water-analyses/${final.id}`).set('Authorization', editor.auth).send({ version: final.version, solutes: { Ca: { value: '3', unit: 'mmol/L' }, HCO3: { value: '6', unit: 'mmol/L' } } }).expect(200);
    const after = (await request(app()).get(`/api/mass-balance-models/${model.id}`).set('Authorization', editor.auth).expect(200)).body as MassBalanceModel;
    const refused = await request(app()).delete(`/api/water-analyses/${final.id}`).set('Authorization', editor.auth).expect(409);
    const csv = await request(app()).get(`/api/mass-balance-models/${model.id}/models.csv`).set('Authorization', editor.auth).expect(200);

    expect(after.result.models[0].transfers).toEqual({ calcite: '2', CO2: '2' });
    expect(refused.body.code).toBe('WATER_ANALYSIS_IN_USE');
    expect(csv.text.split('\n')[0]).toBe('model,phases,valid,robust,implied_reaction,residuals,transfer:calcite,transfer:CO2');
    expect(csv.text).toContain(',2,2');
  });

  it('When a water changes only in notes, site or pH, then its models keep their result; a rename solves them again and the team export shows the new name', async () => {
    const initial = await saveWater(app(), editor, teamId, mmolWater('Quiet initial', { Ca: '1', HCO3: '2' }));
    const final = await saveWater(app(), editor, teamId, mmolWater('Quiet final', { Ca: '2', HCO3: '4' }));
    const model = await saveModel({ name: 'Quiet model', initialWaterId: initial.id, finalWaterId: final.id, phases: [{ name: 'calcite', formula: 'CaCO3', rule: 'dissolve' }, { name: 'CO2', formula: 'CO2(g)' }], constraints: ['Ca', 'C'] });
    const read = async () => (await request(app()).get(`/api/mass-balance-models/${model.id}`).set('Authorization', editor.auth).expect(200)).body as MassBalanceModel;

    const edited = await request(app())
      .patch(`/api/water-analyses/${final.id}`)
      .set('Authorization', editor.auth)
      .send({ version: final.version, notes: 'resampled', site: 'Pit 2', pH: 7.4, solutes: { HCO3: { value: '4', unit: 'mmol/L' }, Ca: { value: '2', unit: 'mmol/L' } } })
      .expect(200);
    const untouched = await read();
    await request(app()).patch(`/api/water-analyses/${final.id}`).set('Authorization', editor.auth).send({ version: edited.body.version, name: 'Loud final' }).expect(200);
    const renamed = await read();
    const csv = await request(app()).get(`/api/teams/${teamId}/mass-balance-models/export.csv`).set('Authorization', editor.auth).expect(200);

    expect([untouched.version, untouched.result.solvedAt]).toEqual([model.version, model.result.solvedAt]);
    expect(renamed.result.final.name).toBe('Loud final');
    expect(renamed.result.solvedAt).not.toBe(model.result.solvedAt);
    expect(csv.text.split('\n').find((line) => line.startsWith('Quiet model,'))).toMatch(/^Quiet model,Quiet initial,Loud final,/);
  });

  it('When a model names an unknown species or another team\'s water, then 400 with the path; a stale version gets 409', async () => {
    const other = await createTeam(app(), owner, 'Other team');
    const foreign = await saveWater(app(), owner, other, mmolWater('Foreign', { Ca: '1' }));
    const mine = await saveWater(app(), editor, teamId, mmolWater('Mine', { Ca: '1' }));

    const species = await request(app()).post(`/api/teams/${teamId}/mass-balance-models`).set('Authorization', editor.auth).send({ name: 'x', initialWaterId: null, finalWaterId: mine.id, phases: [{ name: 'p', speciesId: 'builtin:unobtainium' }], constraints: ['Ca'] }).expect(400);
    const water = await request(app()).post(`/api/teams/${teamId}/mass-balance-models`).set('Authorization', editor.auth).send({ name: 'x', initialWaterId: foreign.id, finalWaterId: mine.id, phases: [{ name: 'p', formula: 'CaCO3' }], constraints: ['Ca'] }).expect(400);
    const model = await saveModel({ name: 'Pure water start', initialWaterId: null, finalWaterId: mine.id, phases: [{ name: 'lime', formula: 'CaO' }], constraints: ['Ca'] });
    await request(app()).patch(`/api/mass-balance-models/${model.id}`).set('Authorization', editor.auth).send({ name: 'Renamed', version: model.version }).expect(200);
    const stale = await request(app()).patch(`/api/mass-balance-models/${model.id}`).set('Authorization', editor.auth).send({ name: 'Again', version: model.version }).expect(409);

    expect([species.body.code, species.body.issues[0].path]).toEqual(['MASS_BALANCE_UNKNOWN_SPECIES', ['phases', 0, 'speciesId']]);
    expect([water.body.code, water.body.issues[0].path]).toEqual(['MASS_BALANCE_UNKNOWN_WATER', ['initialWaterId']]);
    expect(model.result).toMatchObject({ status: 'exact', initial: { name: 'pure water' }, models: [{ transfers: { lime: '1' } }] });
    expect(stale.body.code).toBe('VERSION_CONFLICT');
  });
});

describe('water-analysis CSV', () => {
  const header = 'sample,site,date,ph,Ca (mg/L),SO4 (mg/L),alkalinity (mg/L as CaCO3)';

  it('When a CSV has an unknown solute, a bad unit, a non-numeric value and duplicate samples, then the preview lists each by line and column and the import changes nothing', async () => {
    await saveWater(app(), editor, teamId, mmolWater('Saved well', { Ca: '1' }));
    const before = await waterCount();
    const csv = [`${header},Xx (mg/L),Mg (ppm)`, 'W-1,Pit,2026-01-02,7.1,40,96,100,1,2', 'W-2,Pit,2026-01-02,7.0,forty,96,100,,', 'W-1,Pit,2026-01-03,7.2,41,97,101,,', 'Saved well,Pit,,7,1,1,1,,'].join('\n');

    const preview = await uploadCsv(app(), editor, `/api/teams/${teamId}/water-analyses/import/preview`, csv).expect(200);
    const refused = await uploadCsv(app(), editor, `/api/teams/${teamId}/water-analyses/import`, csv, { skipInvalid: 'true' }).expect(400);

    expect(preview.body.issues.map((issue: { code: string; line: number; column: string | null }) => [issue.code, issue.line, issue.column])).toEqual([
      ['CSV_UNKNOWN_SOLUTE', 1, 'Xx (mg/L)'],
      ['CSV_BAD_UNIT', 1, 'Mg (ppm)'],
      ['CSV_BAD_VALUE', 3, 'Ca (mg/L)'],
      ['CSV_DUPLICATE_IN_FILE', 4, 'sample'],
      ['CSV_DUPLICATE_SAVED', 5, 'sample'],
    ]);
    expect(preview.body).toMatchObject({ validCount: 0, invalidCount: 4 });
    expect(refused.body.code).toBe('IMPORT_INVALID');
    expect(refused.body.issues[0].path).toEqual([1, 'Xx (mg/L)']);
    expect(await waterCount()).toBe(before);
  });

  it('When only rows are bad, then import saves nothing by default and, with skipInvalid, the valid rows in one go; the export reads back with the same figures', async () => {
    const csv = [header, 'C-1,Pit,2026-01-02,7.1,40.078,96.056,100.086', 'C-2,Pit,2026-01-02,7.0,<0.5,12,lots', 'C-3,Pit,2026-01-03,6.9,20,48,50'].join('\n');
    const before = await waterCount();

    await uploadCsv(app(), editor, `/api/teams/${teamId}/water-analyses/import`, csv).expect(400);
    expect(await waterCount()).toBe(before);
    const imported = await uploadCsv(app(), editor, `/api/teams/${teamId}/water-analyses/import`, csv, { skipInvalid: 'true' }).expect(201);
    const exported = await request(app()).get(`/api/teams/${teamId}/water-analyses/export.csv`).set('Authorization', editor.auth).expect(200);

    expect(imported.body.created.map((water: { name: string }) => water.name)).toEqual(['C-1', 'C-3']);
    expect(imported.body.skippedLines).toEqual([3]);
    expect(imported.body.created[0].converted.Ca.mmolPerL).toBeCloseTo(1, 12);
    expect(await waterCount()).toBe(before + 2);
    const otherTeam = await createTeam(app(), editor, 'Round trip');
    const reimported = await uploadCsv(app(), editor, `/api/teams/${otherTeam}/water-analyses/import`, exported.text).expect(201);
    const again = reimported.body.created.find((water: { name: string }) => water.name === 'C-1');
    expect(again.chargeBalance.cbePercent).toBe(imported.body.created[0].chargeBalance.cbePercent);
    expect(again.solutes).toEqual(imported.body.created[0].solutes);
  });

  it('When a laboratory reports trace iron in µg/L, then it is stored as reported, converted through M(Fe) = 55.845 g/mol (IUPAC 2021), and exported in the same unit', async () => {
    const csv = ['sample,Ca (mg/L),Fe (µg/L),Mn (ug/L)', 'T-1,40.078,55.845,<5'].join('\n');

    const imported = await uploadCsv(app(), editor, `/api/teams/${teamId}/water-analyses/import`, csv).expect(201);
    const exported = await request(app()).get(`/api/teams/${teamId}/water-analyses/export.csv`).set('Authorization', editor.auth).expect(200);

    const [water] = imported.body.created;
    expect(water.solutes.Fe).toEqual({ value: '55.845', unit: 'µg/L' });
    expect(water.converted.Fe.mmolPerL).toBeCloseTo(0.001, 12);
    expect(water.converted.Fe.meqPerL).toBeCloseTo(0.002, 12);
    expect(water.converted.Mn).toMatchObject({ belowDetection: true, detectionLimit: 5 });
    const [head, ...rows] = exported.text.trim().split('\n');
    const columns = head!.split(',');
    const row = rows.find((line) => line.startsWith('T-1,'))!.split(',');
    expect(row[columns.indexOf('Fe (µg/L)')]).toBe('55.845');
  });

  it('When the template is downloaded, then it has the documented layout', async () => {
    const template = await request(app()).get(`/api/teams/${teamId}/water-analyses/template.csv`).set('Authorization', editor.auth).expect(200);
    expect(template.text.split('\n')[0]).toMatch(/^sample,site,date,temperature_c,ph,notes,Ca \(mg\/L\),/);
  });
});
