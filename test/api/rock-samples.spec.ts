import { checkEquation, DEFAULT_NPR_BANDS, findElement, mineralCo2Uptake, mineralFactor, molarMass, SIDERITE_CAUTION, CO2_CAUTIONS, ABA_NOTES } from '@tallus/chem';
import type { RockSample } from '@tallus/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { uploadCsv } from './support/site-data';
import { addMember, createTeam, registerUser, startTestApp, type SignedInUser, type TestApp } from './support/test-app';

let testApp: TestApp;
let owner: SignedInUser;
let editor: SignedInUser;
let teamId: string;

const app = () => testApp.app;
const save = async (body: object): Promise<RockSample> =>
  (await request(app()).post(`/api/teams/${teamId}/rock-samples`).set('Authorization', editor.auth).send(body).expect(201)).body;
const list = async (): Promise<RockSample[]> => (await request(app()).get(`/api/teams/${teamId}/rock-samples`).set('Authorization', editor.auth).expect(200)).body;

beforeAll(async () => {
  testApp = await startTestApp();
  owner = await registerUser(app(), 'rock-owner');
  editor = await registerUser(app(), 'rock-editor');
  teamId = await createTeam(app(), owner, 'Rock team');
  await addMember(testApp, teamId, editor, 'editor');
});

afterAll(async () => {
  await testApp.close();
});

describe('rock samples: acid-base accounting (Sobek et al. 1978) and CO2 uptake', () => {
  it.each([
    // AP = 31.25 × sulfide S; NNP = NP − AP; NPR = NP/AP; bands < 1 PAG, 1–3 uncertain, > 3 NAG (DEFAULT_NPR_BANDS: Price 2009 via GTK)
    ['PAG', { sulfideSulfurPercent: 1.2, totalSulfurPercent: 1.5, neutralisationPotential: 20 }, 37.5, -17.5, 20 / 37.5, 'potentially-acid-generating', 'sulfide'],
    ['uncertain from total S', { totalSulfurPercent: 0.8, neutralisationPotential: 60 }, 25, 35, 2.4, 'uncertain', 'total'],
    ['NAG', { sulfideSulfurPercent: 0.1, neutralisationPotential: 50 }, 3.125, 46.875, 16, 'non-acid-generating', 'sulfide'],
  ] as const)('When a %s sample is saved, then AP, NNP, NPR and the class follow Sobek et al. 1978 and the default bands with their source', async (label, fields, ap, nnp, npr, classification, basis) => {
    const sample = await save({ name: `Sobek ${label}`, ...fields });

    expect(sample.aba).toMatchObject({ acidPotential: expect.closeTo(ap, 10), netNeutralisationPotential: expect.closeTo(nnp, 10), neutralisationPotentialRatio: expect.closeTo(npr, 10), classification, sulfurBasis: basis, apFactor: 31.25 });
    expect(sample.aba?.bands.source).toBe(DEFAULT_NPR_BANDS.source);
    if (basis === 'total') expect(sample.aba?.notes).toContainEqual({ code: 'TOTAL_SULFUR', message: ABA_NOTES.TOTAL_SULFUR });
  });

  it('When pyrite, calcite and siderite modes are given, then mineral AP and NP come from the balanced reactions (pyrite per wt% ≈ 31.25 × its S fraction) with the siderite caution', async () => {
    const sample = await save({ name: 'Modes', modes: [{ mineral: 'pyrite', weightPercent: 2 }, { mineral: 'calcite', weightPercent: 3 }, { mineral: 'siderite', weightPercent: 1 }] });
    const sulfurFraction = (2 * findElement('S')!.atomicWeight.toNumber()) / Number(molarMass('FeS2'));
    const pyrite = sample.mineralAba!.minerals.find((entry) => entry.mineral === 'pyrite')!;

    expect(pyrite.kgCaco3PerTonnePerPercent).toBe(mineralFactor('pyrite').kgCaco3PerTonnePerPercent);
    expect(pyrite.kgCaco3PerTonnePerPercent / (31.25 * sulfurFraction)).toBeCloseTo(1, 2);
    expect(sample.mineralAba!.acidPotential).toBeCloseTo(2 * mineralFactor('pyrite').kgCaco3PerTonnePerPercent, 10);
    expect(sample.mineralAba!.neutralisationPotential).toBeCloseTo(3 * -mineralFactor('calcite').kgCaco3PerTonnePerPercent, 10);
    expect(sample.mineralAba!.cautions).toContain(SIDERITE_CAUTION);
    expect(sample.mineralAba!.pathway).toBe('co2');
  });

  it('When a basalt has a forsterite mode and an oxide analysis, then CO2 uptake is the stoichiometric maximum (forsterite 1.2512 t/t bicarbonate) with the cautions', async () => {
    const sample = await save({ name: 'Basalt', modes: [{ mineral: 'forsterite', formula: 'Mg2SiO4', weightPercent: 50 }], oxides: { CaO: 10, MgO: 8, Na2O: 3, K2O: 1 } });

    expect(sample.co2.fromModes?.bicarbonate).toBeCloseTo(0.5 * mineralCo2Uptake('Mg2SiO4').bicarbonate, 12);
    expect(mineralCo2Uptake('Mg2SiO4').bicarbonate).toBeCloseTo(1.2512, 4);
    expect(sample.co2.fromOxides?.carbonateKgPerTonne).toBeGreaterThan(0);
    expect(sample.co2.cautions).toContain(CO2_CAUTIONS.THEORETICAL);
  });

  it('When the owner sets stricter bands and the bicarbonate pathway, then classes and AP follow the team (62.5 × S)', async () => {
    const settings = (await request(app()).get(`/api/teams/${teamId}/settings`).set('Authorization', owner.auth).expect(200)).body;
    await request(app())
      .patch(`/api/teams/${teamId}/settings`)
      .set('Authorization', owner.auth)
      .send({ version: settings.version, carbonatePathway: 'bicarbonate', nprBands: { acidGenerating: 2, nonAcidGenerating: 4, source: 'Permit condition 7 (invented)' } })
      .expect(200);

    const nag = (await list()).find((sample) => sample.name === 'Sobek NAG')!;
    expect(nag.aba).toMatchObject({ apFactor: 62.5, acidPotential: 6.25, neutralisationPotentialRatio: 8, bands: { source: 'Permit condition 7 (invented)' } });
    const uncertain = (await list()).find((sample) => sample.name === 'Sobek uncertain from total S')!;
    expect(uncertain.aba?.classification).toBe('potentially-acid-generating');
  });

  it('When a rock CSV has a bad value, an unknown column and a duplicate, then the preview names each by line and column and the import saves nothing', async () => {
    const before = (await list()).length;
    const csv = ['sample,total_s_pct,np_kg_caco3_t,mode:pyrite', 'R-1,1.0,12,1.5', 'R-2,lots,10,', 'R-1,0.5,10,', 'Modes,0.2,5,'].join('\n');

    const preview = await uploadCsv(app(), editor, `/api/teams/${teamId}/rock-samples/import/preview`, csv).expect(200);
    const refused = await uploadCsv(app(), editor, `/api/teams/${teamId}/rock-samples/import`, csv).expect(400);

    expect(preview.body.issues.map((issue: { code: string; line: number; column: string | null }) => [issue.code, issue.line, issue.column])).toEqual([
      ['CSV_BAD_VALUE', 3, 'total_s_pct'],
      ['CSV_DUPLICATE_IN_FILE', 4, 'sample'],
      ['CSV_DUPLICATE_SAVED', 5, 'sample'],
    ]);
    expect(refused.body.code).toBe('IMPORT_INVALID');
    expect((await list()).length).toBe(before);
  });

  it('When a rock sample is added or renamed with a name the team uses, then 409 ROCK_SAMPLE_DUPLICATE names it', async () => {
    await save({ name: 'Taken rock', totalSulfurPercent: 1 });
    const other = await save({ name: 'Free rock', totalSulfurPercent: 1 });

    const added = await request(app()).post(`/api/teams/${teamId}/rock-samples`).set('Authorization', editor.auth).send({ name: 'Taken rock' }).expect(409);
    const renamed = await request(app()).patch(`/api/rock-samples/${other.id}`).set('Authorization', editor.auth).send({ name: 'Taken rock', version: other.version }).expect(409);

    expect([added.body.code, added.body.detail]).toEqual(['ROCK_SAMPLE_DUPLICATE', 'The team already has a rock sample named "Taken rock".']);
    expect(renamed.body.code).toBe('ROCK_SAMPLE_DUPLICATE');
  });

  it('When a rock CSV has no sample column, then even with skipInvalid the import answers 400 CSV_MISSING_VALUE on the header and saves nothing', async () => {
    const before = (await list()).length;

    const refused = await uploadCsv(app(), editor, `/api/teams/${teamId}/rock-samples/import`, ['site,total_s_pct', 'Pit,1.0', 'Pit,0.5'].join('\n'), { skipInvalid: 'true' }).expect(400);

    expect(refused.body.code).toBe('IMPORT_INVALID');
    expect(refused.body.issues).toContainEqual(expect.objectContaining({ code: 'CSV_MISSING_VALUE', path: [1] }));
    expect((await list()).length).toBe(before);
  });
});

describe('mineral formulas from oxide analyses', () => {
  it('When an olivine analysis (Fo90, exact synthetic oxides) is saved into a reaction set, then the species carries its provenance and the reaction its proton budget as libs/chem computes', async () => {
    const setId = (await request(app()).post(`/api/teams/${teamId}/reaction-sets`).set('Authorization', editor.auth).send({ name: 'Basalt weathering' }).expect(201)).body.id;
    const analysis = { oxides: { MgO: 49.35217246375826, FeO: 9.774760372519541, SiO2: 40.873067163722204 }, group: 'olivine' };

    const preview = await request(app()).post(`/api/teams/${teamId}/mineral-formulas/recalculate`).set('Authorization', editor.auth).send({ analysis }).expect(200);
    const saved = await request(app())
      .post(`/api/teams/${teamId}/mineral-formulas`)
      .set('Authorization', editor.auth)
      .send({ analysis, name: 'Olivine Fo90 (test)', sampleName: 'OL-1', reactionSetId: setId })
      .expect(201);

    const expected = checkEquation(preview.body.weathering.equation, { reference: 'Mg1.8Fe0.2SiO4' });
    expect(preview.body).toMatchObject({ formula: 'Mg1.8Fe0.2SiO4', endMembers: { Fo: expect.closeTo(0.9, 10) } });
    expect(saved.body.species).toMatchObject({ formula: 'Mg1.8Fe0.2SiO4', phase: 'mineral', source: expect.stringContaining('OL-1 on 4 O (olivine)') });
    expect(saved.body.species.source).toContain(editor.displayName);
    expect(saved.body.mineralFormula).toMatchObject({ analysis, basis: '4 O (olivine), all Fe as analysed, anhydrous', createdBy: { id: editor.id } });
    expect(saved.body.reaction.result.protonBudget.perMole).toBe(expected.protonBudget!.perMole.toString());
    expect(saved.body.reaction.result.protonBudget.perMole).toBe('-18/5');
  });

  it('When an oxide is unknown, then 422 names analysis.oxides.<key>', async () => {
    const response = await request(app()).post(`/api/teams/${teamId}/mineral-formulas/recalculate`).set('Authorization', editor.auth).send({ analysis: { oxides: { Xx2O: 5, SiO2: 40 }, oxygens: 4 } }).expect(422);
    expect(response.body.code).toBe('OXIDES_UNKNOWN_OXIDE');
    expect(response.body.issues[0].path.slice(0, 2)).toEqual(['analysis', 'oxides']);
  });
});

describe('stateless site chemistry', () => {
  it('When co2, oxides and mass-balance are posted, then the answers are the command line JSON', async () => {
    const co2 = await request(app()).post('/api/chem/co2').set('Authorization', editor.auth).send({ formula: 'CaSiO3' }).expect(200);
    const oxides = await request(app()).post('/api/chem/oxides').set('Authorization', editor.auth).send({ oxides: { FeO: 100 }, oxygens: 4, ferric: 'droop', cations: 3 }).expect(200);
    const balance = await request(app())
      .post('/api/chem/mass-balance')
      .set('Authorization', editor.auth)
      .send({ initial: {}, final: { Ca: '1', HCO3: '2' }, constraints: ['Ca', 'C'], phases: [{ name: 'calcite', formula: 'CaCO3', rule: 'dissolve' }, { name: 'CO2', formula: 'CO2(g)' }] })
      .expect(200);

    expect(co2.body.bicarbonate).toBeCloseTo(0.7577, 4);
    expect(oxides.body.ferricIron.method).toBe('droop');
    expect(balance.body).toMatchObject({ status: 'exact', models: [{ transfers: { calcite: '1', CO2: '1' }, valid: true }] });
  });
});
