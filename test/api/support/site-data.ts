import type { CreateWaterAnalysisInput } from '@tallus/contracts';
import type { Express } from 'express';
import request from 'supertest';
import type { SignedInUser } from './test-app';

/**
 * chim.lu exercise (shared/reference/check-values.md §4; inputs confirmed, sums computed):
 * mmol/L, Σ+ 1.498 and Σ− 1.464 meq/L, CBE +1.15 % (standard), +2.30 % (half-sum).
 */
export const CHIM_LU_MMOL = { Ca: '0.259', Mg: '0.25', Na: '0.34', K: '0.14', Cl: '0.21', NO3: '0.064', SO4: '0.070', HCO3: '1.05' } as const;

/** A water of exact mmol/L values. */
export function mmolWater(name: string, values: Readonly<Record<string, string>>, extra: Partial<CreateWaterAnalysisInput> = {}): CreateWaterAnalysisInput {
  return { name, site: 'Test site', solutes: Object.fromEntries(Object.entries(values).map(([key, value]) => [key, { value, unit: 'mmol/L' }])), ...extra };
}

/** Saves a water analysis through the API and returns its body. */
export async function saveWater(app: Express, user: SignedInUser, teamId: string, body: CreateWaterAnalysisInput): Promise<{ id: string; version: number } & Record<string, unknown>> {
  const response = await request(app).post(`/api/teams/${teamId}/water-analyses`).set('Authorization', user.auth).send(body).expect(201);
  return response.body;
}

/** Uploads a CSV text to a multipart route. */
export function uploadCsv(app: Express, user: SignedInUser, path: string, csv: string, fields: Record<string, string> = {}): request.Test {
  let test = request(app).post(path).set('Authorization', user.auth);
  for (const [name, value] of Object.entries(fields)) test = test.field(name, value);
  return test.attach('file', Buffer.from(csv, 'utf8'), { filename: 'upload.csv', contentType: 'text/csv' });
}
