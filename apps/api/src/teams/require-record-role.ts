import type { EntityManager } from '@mikro-orm/postgresql';
import { hasRole, type ApiErrorCode, type Role } from '@tallus/contracts';
import type { RequestHandler } from 'express';
import { z } from 'zod';
import { ForbiddenError, NotFoundError } from '../errors/app-errors';
import { currentUserId } from '../http/locals';
import { parseIdParam } from '../http/validate';

/** How to find the team of one kind of record. */
export interface RecordKind {
  /** Code of the 404 for an unknown record, a malformed id, or a record of a team the caller is not in. */
  notFound: ApiErrorCode;
  /** SQL that selects `team_id` of the record whose id is the one `?` parameter. */
  teamSql: string;
}

const recordIdSchema = z.uuid();

/**
 * Middleware for every `/<records>/:id` route: finds the caller's role in the record's team, in
 * one statement, into `res.locals.recordRole`, and the id into `res.locals.recordId`. Must follow
 * `requireUser`. No entity is loaded: these routes load their own records.
 *
 * @param em request-scoped EntityManager
 * @param kind which table, and which 404 code
 * @param required the weakest role allowed
 * @throws NotFoundError `kind.notFound` when the record does not exist, the id is malformed, or the caller is not in its team:
 *   an outsider cannot tell these apart
 * @throws ForbiddenError TEAM_ROLE_REQUIRED when the caller is a member with a weaker role
 */
export function requireRecordRole(em: EntityManager, kind: RecordKind, required: Role): RequestHandler {
  const roleSql = `select m.role from memberships m where m.user_id = ? and m.team_id = (${kind.teamSql})`;
  return async (req, res, next) => {
    const id = parseIdParam(recordIdSchema, req.params['id'], kind.notFound);
    const rows = await em.execute<Array<{ role: Role }>>(roleSql, [currentUserId(res), id]);
    const role = rows[0]?.role;
    if (!role) throw new NotFoundError(kind.notFound, 'No such record, or it belongs to a team you are not a member of.');
    if (!hasRole(role, required)) {
      throw new ForbiddenError('TEAM_ROLE_REQUIRED', `This needs the ${required} role in the team; you are ${role}.`);
    }
    res.locals.recordRole = role;
    res.locals.recordId = id;
    next();
  };
}

/** The record kinds of the reaction-set feature. */
export const RECORD_KINDS = {
  species: { notFound: 'SPECIES_NOT_FOUND', teamSql: 'select team_id from species where id = ?' },
  reactionSet: { notFound: 'REACTION_SET_NOT_FOUND', teamSql: 'select team_id from reaction_sets where id = ?' },
  reaction: {
    notFound: 'REACTION_NOT_FOUND',
    teamSql: 'select s.team_id from reactions r join reaction_sets s on s.id = r.set_id where r.id = ?',
  },
  netReaction: {
    notFound: 'NET_REACTION_NOT_FOUND',
    teamSql: 'select s.team_id from net_reactions n join reaction_sets s on s.id = n.set_id where n.id = ?',
  },
} as const satisfies Record<string, RecordKind>;
