import type { MigrationObject } from '@mikro-orm/core';
import { Migration20261201222709 } from './migrations/Migration20261201222709';
import { Migration20261201225409 } from './migrations/Migration20261201225409';
import { Migration20261201233038 } from './migrations/Migration20261201233038';

/**
 * Every migration, in order. The CLI writes new files into ./migrations
 * (`npm run -w apps/api db:migration:create`); add each one here, so the
 * bundle and tsx both run exactly this list.
 */
export const MIGRATIONS: MigrationObject[] = [
  // Accounts, teams, memberships, invitations, revoked session tokens.
  { name: 'Migration20261201222709', class: Migration20261201222709 },
  // Species, reaction sets, reactions, net reactions, revisions, review comments, publications, audit events.
  { name: 'Migration20261201225409', class: Migration20261201225409 },
  // Team settings, water analyses, mass-balance models, rock samples, mineral formulas; audit entity types for them.
  { name: 'Migration20261201233038', class: Migration20261201233038 },
];
