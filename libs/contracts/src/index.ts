/**
 * @tallus/contracts: the zod schemas and types of every API request and
 * response, the problem body, error codes and roles. Sole entry point.
 */

// Roles and their ranking
export * from './roles';

// Errors
export * from './error-codes';
export * from './problem';

// Features
export * from './auth';
export * from './teams';
export * from './invitations';
export * from './outbox';
export * from './health';
export * from './activity';
export * from './chem-results';
export * from './chem';
export * from './species';
export * from './reactions';
export * from './reaction-sets';
export * from './review';
export * from './library';
export * from './import-export';

// Site data (issues 6 and 7)
export * from './csv-import';
export * from './team-settings';
export * from './water-analyses';
export * from './mass-balance';
export * from './rock-samples';
export * from './mineral-formulas';
export * from './site-chem';
export * from './reports';
