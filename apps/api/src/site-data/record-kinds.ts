import type { RecordKind } from '../teams/require-record-role';

/** The record kinds of site data, for `requireRecordRole`. */
export const SITE_RECORD_KINDS = {
  waterAnalysis: { notFound: 'WATER_ANALYSIS_NOT_FOUND', teamSql: 'select team_id from water_analyses where id = ?' },
  massBalanceModel: { notFound: 'MASS_BALANCE_MODEL_NOT_FOUND', teamSql: 'select team_id from mass_balance_models where id = ?' },
  rockSample: { notFound: 'ROCK_SAMPLE_NOT_FOUND', teamSql: 'select team_id from rock_samples where id = ?' },
} as const satisfies Record<string, RecordKind>;
