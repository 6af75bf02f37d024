import type { MassBalanceModel, MineralFormula, RockSample, WaterAnalysis } from '@tallus/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../apps/api/src/db/seeders/demo-accounts';
import { seedDemo } from '../../apps/api/src/db/seeders/demo-seeder';
import { startTestApp, type TestApp } from './support/test-app';

let testApp: TestApp;

async function viewerOf(email: string): Promise<{ auth: string; teamId: string }> {
  const auth = `Bearer ${(await request(testApp.app).post('/api/auth/login').send({ email, password: DEMO_PASSWORD }).expect(200)).body.token}`;
  const teamId = (await request(testApp.app).get('/api/auth/me').set('Authorization', auth)).body.memberships[0].teamId;
  return { auth, teamId };
}

const get = async <T>(auth: string, path: string): Promise<T> => (await request(testApp.app).get(path).set('Authorization', auth).expect(200)).body as T;

describe('The demo site data', () => {
  beforeAll(async () => {
    testApp = await startTestApp();
    await seedDemo(testApp.orm.em, 10);
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('When the Kestrel Flats viewer signs in, then the waters show one CBE flag, a low-pH note and a value below detection, and the seep model recovers its invented transfers exactly', async () => {
    const { auth, teamId } = await viewerOf('viewer@kestrel.example');

    const waters = (await get<WaterAnalysis[]>(auth, `/api/teams/${teamId}/water-analyses`)).filter((water) => water.name.endsWith('(invented)'));
    const models = await get<MassBalanceModel[]>(auth, `/api/teams/${teamId}/mass-balance-models`);
    const rocks = (await get<RockSample[]>(auth, `/api/teams/${teamId}/rock-samples`)).filter((rock) => rock.name.endsWith('(invented)'));

    expect(waters.filter((water) => water.chargeBalance.flagged).map((water) => water.name)).toEqual(['KF-MW-03 downgradient well (invented)']);
    expect(waters.some((water) => water.chargeBalance.notes.some((note) => note.code === 'LOW_PH'))).toBe(true);
    expect(waters.some((water) => Object.values(water.solutes).some((entry) => entry.value.startsWith('<')))).toBe(true);
    const seep = models.find((model) => model.name === 'Tailings seep from upgradient groundwater (invented)')!;
    expect(seep.result.models).toContainEqual(expect.objectContaining({ valid: true, robust: true, transfers: { pyrite: '2', calcite: '3', dolomite: '9/20', 'Fe(OH)3': '-17/10', CO2: '-29/10', O2: '297/40' } }));
    expect(rocks).toHaveLength(8);
    expect(new Set(rocks.map((rock) => rock.aba?.classification))).toEqual(new Set(['potentially-acid-generating', 'uncertain', 'non-acid-generating']));
  });

  it('When the Ironbark Creek viewer signs in, then the basalt model is exact, the feedstock has CO2 figures, and two microprobe analyses are species with their weathering reactions', async () => {
    const { auth, teamId } = await viewerOf('viewer@ironbark.example');

    const models = await get<MassBalanceModel[]>(auth, `/api/teams/${teamId}/mass-balance-models`);
    const rocks = await get<RockSample[]>(auth, `/api/teams/${teamId}/rock-samples`);
    const formulas = await get<MineralFormula[]>(auth, `/api/teams/${teamId}/mineral-formulas`);

    expect(models[0].result.models[0].transfers).toEqual({ forsterite: '1/5', diopside: '1/20', anorthite: '1/10', kaolinite: '-1/10', CO2: '6/5' });
    expect(rocks.find((rock) => rock.name.startsWith('IB-BAS-01'))?.co2.fromOxides?.carbonateKgPerTonne).toBeGreaterThan(100);
    expect(formulas.map((formula) => [formula.result.endMembers?.Fo ?? formula.result.endMembers?.An, formula.speciesId !== null, formula.reactionId !== null])).toEqual(
      expect.arrayContaining([
        [expect.closeTo(0.9, 2), true, true],
        [expect.closeTo(0.65, 2), true, true],
      ]),
    );
  });
});
