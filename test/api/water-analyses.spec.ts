import { chargeBalance, findSolute, toMilliequivalentsPerLitre, toMillimolesPerLitre, CHARGE_BALANCE_NOTES } from '@tallus/chem';
import type { WaterAnalysis } from '@tallus/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CHIM_LU_MMOL, mmolWater, saveWater, uploadCsv } from './support/site-data';
import { addMember, createTeam, registerUser, startTestApp, type SignedInUser, type TestApp } from './support/test-app';

let testApp: TestApp;
let owner: SignedInUser;
let editor: SignedInUser;
let teamId: string;

const app = () => testApp.app;

beforeAll(async () => {
  testApp = await startTestApp();
  owner = await registerUser(app(), 'water-owner');
  editor = await registerUser(app(), 'water-editor');
  teamId = await createTeam(app(), owner, 'Water team');
  await addMember(testApp, teamId, editor, 'editor');
});

afterAll(async () => {
  await testApp.close();
});

describe('water analyses: conversions and charge balance', () => {
  it('When the chim.lu worked example is saved in mmol/L, then the API shows Σ+ 1.498, Σ− 1.464 meq/L and CBE +1.15 %, not flagged, exactly as libs/chem computes', async () => {
    const saved = (await saveWater(app(), editor, teamId, mmolWater('chim.lu exercise', CHIM_LU_MMOL))) as unknown as WaterAnalysis;

    const engine = chargeBalance({ solutes: Object.fromEntries(Object.entries(CHIM_LU_MMOL).map(([key, value]) => [key, { value, unit: 'mmol/L' }])) });
    expect(saved.chargeBalance.cationsMeq).toBeCloseTo(1.498, 12);
    expect(saved.chargeBalance.anionsMeq).toBeCloseTo(1.464, 12);
    expect(saved.chargeBalance.cbePercent).toBeCloseTo((0.034 / 2.962) * 100, 10);
    expect(saved.chargeBalance).toMatchObject({ flagged: false, threshold: 5, convention: 'standard', cbePercent: engine.cbePercent });
  });

  it('When solutes come in mg/L and as alkalinity in mg/L as CaCO3, then each is converted through IUPAC 2021 molar masses as libs/chem converts it (Ca 40.078 mg/L = 1 mmol/L = 2 meq/L; 100.086 mg/L as CaCO3 = 2 meq/L)', async () => {
    const saved = (await saveWater(app(), editor, teamId, {
      name: 'Units',
      solutes: { Ca: { value: 40.078, unit: 'mg/L' }, SO4: { value: '96.056', unit: 'mg/L' }, alkalinity: { value: '100.086', unit: 'mg/L as CaCO3' }, Fe: { value: '<0.01', unit: 'mg/L' } },
    })) as unknown as WaterAnalysis;

    expect(saved.converted.Ca).toMatchObject({ mmolPerL: expect.closeTo(1, 12), meqPerL: expect.closeTo(2, 12) });
    expect(saved.converted.SO4.mmolPerL).toBe(toMillimolesPerLitre(findSolute('SO4')!, 96.056, 'mg/L'));
    expect(saved.converted.alkalinity.meqPerL).toBe(toMilliequivalentsPerLitre(findSolute('alkalinity')!, 100.086, 'mg/L as CaCO3'));
    expect(saved.converted.alkalinity.meqPerL).toBeCloseTo(2, 12);
    expect(saved.solutes.Fe).toEqual({ value: '<0.01', unit: 'mg/L' });
    expect(saved.converted.Fe).toMatchObject({ belowDetection: true, detectionLimit: 0.01 });
    expect(saved.chargeBalance.contributions.Fe).toBe(0);
    expect(saved.chargeBalance.notes.map((note) => note.code)).toContain('BELOW_DETECTION');
  });

  it('When a water has pH 3.2, then H+ joins the cations and the low-pH note says the CBE is only indicative', async () => {
    const saved = (await saveWater(app(), editor, teamId, mmolWater('Acid seep', { SO4: '5', Fe: '2', Ca: '1', Mg: '0.5' }, { pH: 3.2 }))) as unknown as WaterAnalysis;

    expect(saved.chargeBalance.protonsMeq).toBeCloseTo(1000 * 10 ** -3.2, 10);
    expect(saved.chargeBalance.notes).toContainEqual({ code: 'LOW_PH', message: CHARGE_BALANCE_NOTES.LOW_PH });
  });

  it('When a solute has an unknown unit or a value that is not a number, then 422 names the field, and nothing is saved', async () => {
    const before = (await request(app()).get(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).expect(200)).body.length;

    const badUnit = await request(app()).post(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).send({ name: 'Bad', solutes: { Ca: { value: 1, unit: 'ppm' } } }).expect(422);
    const badValue = await request(app()).post(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).send({ name: 'Bad', solutes: { Ca: { value: 'lots', unit: 'mg/L' } } }).expect(422);
    const unknown = await request(app()).post(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).send({ name: 'Bad', solutes: { Unobtainium: { value: 1, unit: 'mg/L' } } }).expect(422);

    expect([badUnit.body.code, badUnit.body.issues[0].path]).toEqual(['WATER_BAD_UNIT', ['solutes', 'Ca', 'unit']]);
    expect([badValue.body.code, badValue.body.issues[0].path]).toEqual(['WATER_BAD_VALUE', ['solutes', 'Ca', 'value']]);
    expect(unknown.body.code).toBe('WATER_UNKNOWN_SOLUTE');
    expect((await request(app()).get(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).expect(200)).body.length).toBe(before);
  });

  it('When the owner lowers the team threshold to 1 %, then the chim.lu water (1.15 %) is flagged; a stale version gets 409 and an editor 403', async () => {
    const settings = await request(app()).get(`/api/teams/${teamId}/settings`).set('Authorization', editor.auth).expect(200);
    expect(settings.body).toMatchObject({ cbeThresholdPercent: 5, version: 0, defaults: { cbeThresholdSource: expect.stringContaining('Marshall Miller') } });

    await request(app()).patch(`/api/teams/${teamId}/settings`).set('Authorization', editor.auth).send({ cbeThresholdPercent: 1, version: 0 }).expect(403);
    await request(app()).patch(`/api/teams/${teamId}/settings`).set('Authorization', owner.auth).send({ cbeThresholdPercent: 1, version: 0 }).expect(200);
    const stale = await request(app()).patch(`/api/teams/${teamId}/settings`).set('Authorization', owner.auth).send({ cbeThresholdPercent: 2, version: 0 }).expect(409);

    const list = (await request(app()).get(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).expect(200)).body as WaterAnalysis[];
    expect(stale.body.code).toBe('VERSION_CONFLICT');
    expect(list.find((water) => water.name === 'chim.lu exercise')?.chargeBalance).toMatchObject({ threshold: 1, flagged: true });
    await request(app()).patch(`/api/teams/${teamId}/settings`).set('Authorization', owner.auth).send({ cbeThresholdPercent: 5, version: 1 }).expect(200);
  });

  it('When two editors change the same analysis, then the second write with the old version gets 409 VERSION_CONFLICT', async () => {
    const saved = await saveWater(app(), editor, teamId, mmolWater('Versioned', { Na: '1', Cl: '1' }));

    await request(app()).patch(`/api/water-analyses/${saved.id}`).set('Authorization', editor.auth).send({ site: 'Well 2', version: saved.version }).expect(200);
    const stale = await request(app()).patch(`/api/water-analyses/${saved.id}`).set('Authorization', editor.auth).send({ site: 'Well 3', version: saved.version }).expect(409);

    expect(stale.body.code).toBe('VERSION_CONFLICT');
  });

  it('When a sample name is already used in the team, then 409 WATER_ANALYSIS_DUPLICATE', async () => {
    await saveWater(app(), editor, teamId, mmolWater('Twin', { Na: '1' }));
    const clash = await request(app()).post(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).send(mmolWater('Twin', { Na: '2' })).expect(409);
    expect(clash.body.code).toBe('WATER_ANALYSIS_DUPLICATE');
  });

  it('When an analysis is renamed to a name the team uses, then 409 WATER_ANALYSIS_DUPLICATE names it, and keeping its own name is no clash', async () => {
    await saveWater(app(), editor, teamId, mmolWater('Renamed twin', { Na: '1' }));
    const other = await saveWater(app(), editor, teamId, mmolWater('To rename', { Na: '2' }));

    const clash = await request(app()).patch(`/api/water-analyses/${other.id}`).set('Authorization', editor.auth).send({ name: 'Renamed twin', version: other.version }).expect(409);
    await request(app()).patch(`/api/water-analyses/${other.id}`).set('Authorization', editor.auth).send({ name: 'To rename', version: other.version }).expect(200);

    expect([clash.body.code, clash.body.detail]).toEqual(['WATER_ANALYSIS_DUPLICATE', 'The team already has a water analysis named "Renamed twin".']);
  });
});

describe('water analyses: CSV header problems', () => {
  it('When a CSV has no sample column, then even with skipInvalid the import answers 400 CSV_MISSING_VALUE on the header and saves nothing', async () => {
    const count = async () => (await request(app()).get(`/api/teams/${teamId}/water-analyses`).set('Authorization', editor.auth).expect(200)).body.length;
    const before = await count();

    const refused = await uploadCsv(app(), editor, `/api/teams/${teamId}/water-analyses/import`, ['site,ph', 'Pit,7.1', 'Pit,6.9'].join('\n'), { skipInvalid: 'true' }).expect(400);

    expect(refused.body.code).toBe('IMPORT_INVALID');
    expect(refused.body.issues).toContainEqual(expect.objectContaining({ code: 'CSV_MISSING_VALUE', path: [1] }));
    expect(await count()).toBe(before);
  });
});
