import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { ROLES } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';

/**
 * An owner's offer of a role in a team to an e-mail address. Only the SHA-256
 * hash of the token is stored; the token itself exists only in the e-mail.
 */
export const Invitation = defineEntity({
  name: 'Invitation',
  tableName: 'invitations',
  properties: {
    ...baseProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade').index(),
    email: p.string().length(254),
    role: p.enum([...ROLES]),
    /** Hex SHA-256 of the token. */
    tokenHash: p.string().length(64).unique(),
    invitedBy: () => p.manyToOne(User).ref().deleteRule('cascade'),
    expiresAt: p.datetime(),
    acceptedAt: p.datetime().nullable(),
    acceptedBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
  },
});

/** An owner's offer of a role in a team to an e-mail address. */
export type Invitation = InferEntity<typeof Invitation>;
