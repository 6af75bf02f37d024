import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { baseProperties } from '../db/base-properties';
import { Revision } from '../review/revision.entity';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';

/** A vetted revision that its team published to the library, for every signed-in user to read and copy. */
export const Publication = defineEntity({
  name: 'Publication',
  tableName: 'publications',
  properties: {
    ...baseProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade').index(),
    revision: () => p.manyToOne(Revision).ref().deleteRule('cascade').unique(),
    publishedBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
  },
});

/** A published vetted revision. */
export type Publication = InferEntity<typeof Publication>;
