import { ABA_NOTES, SIDERITE_CAUTION } from '@tallus/chem';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pdfText } from './support/pdf-text';
import { addReaction, createSet, PUBLISHED } from './support/reaction-sets';
import { mmolWater, saveWater } from './support/site-data';
import { addMember, createTeam, registerUser, startTestApp, type SignedInUser, type TestApp } from './support/test-app';

let testApp: TestApp;
let owner: SignedInUser;
let editor: SignedInUser;
let teamId: string;

const app = () => testApp.app;
const SITE = 'Report pit (test)';

/** Reads a binary answer into a Buffer. */
const binary = (res: request.Response, callback: (error: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (chunk: Buffer) => chunks.push(chunk));
  res.on('end', () => callback(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  testApp = await startTestApp();
  owner = await registerUser(app(), 'report-owner');
  editor = await registerUser(app(), 'report-editor');
  teamId = await createTeam(app(), owner, 'Report team');
  await addMember(testApp, teamId, editor, 'editor');
});

afterAll(async () => {
  await testApp.close();
});

describe('PDF reports', () => {
  it('When a reaction-set report is downloaded, then it is a PDF naming the reactions, their budgets, the review state and the cautions', async () => {
    const setId = await createSet(app(), editor, teamId, 'Pyrite report set');
    await addReaction(app(), editor, setId, { name: 'Pyrite oxidation by O2', equation: PUBLISHED.pyriteToFerrous });
    await addReaction(app(), editor, setId, { name: 'Calcite neutralisation', kind: 'dissolution', equation: PUBLISHED.calcite });

    const response = await request(app()).get(`/api/reaction-sets/${setId}/report.pdf`).set('Authorization', editor.auth).buffer(true).parse(binary).expect(200);
    const text = pdfText(response.body as Buffer);

    expect(response.headers['content-type']).toBe('application/pdf');
    expect((response.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    expect(text).toContain('Pyrite oxidation by O2');
    expect(text).toContain('Calcite neutralisation');
    expect(text).toContain('Review state: draft');
    expect(text).toContain('not a substitute for kinetic testing, site investigation, local regulation or a licensed professional');
    expect(text).toContain('Prohaska et al. 2022');
  });

  it('When a site report is downloaded, then it carries the ABA table with each class, the plot caption, the water CBE, the siderite caution and the references', async () => {
    await saveWater(app(), editor, teamId, mmolWater('Report well', { Na: '1', Cl: '0.9' }, { site: SITE }));
    for (const [name, sulfide, np] of [['Rock PAG', 2, 10], ['Rock uncertain', 0.5, 30], ['Rock NAG', 0.1, 60]] as const) {
      await request(app())
        .post(`/api/teams/${teamId}/rock-samples`)
        .set('Authorization', editor.auth)
        .send({ name, site: SITE, sulfideSulfurPercent: sulfide, neutralisationPotential: np, modes: [{ mineral: 'siderite', weightPercent: 1 }] })
        .expect(201);
    }

    const response = await request(app()).get(`/api/teams/${teamId}/site-report.pdf`).query({ site: SITE }).set('Authorization', editor.auth).buffer(true).parse(binary).expect(200);
    const text = pdfText(response.body as Buffer);

    for (const expected of ['Rock PAG', 'Rock uncertain', 'Rock NAG', 'potentially-acid-generating', 'uncertain', 'non-acid-generating', 'NP against AP', 'Report well', 'Sobek et al. 1978']) {
      expect(text).toContain(expected);
    }
    expect(text).toContain('over ±5 %');
    expect(text).toContain(SIDERITE_CAUTION.slice(0, 60));
    expect(text).toContain(ABA_NOTES.SCREENING_ONLY.slice(0, 60));
  });
});
