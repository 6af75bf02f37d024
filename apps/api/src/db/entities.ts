import { AuditEvent } from '../audit/audit-event.entity';
import { RevokedToken } from '../auth/revoked-token.entity';
import { Invitation } from '../invitations/invitation.entity';
import { Publication } from '../library/publication.entity';
import { NetReaction } from '../net-reactions/net-reaction.entity';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { Reaction } from '../reactions/reaction.entity';
import { ReviewComment } from '../review/review-comment.entity';
import { Revision } from '../review/revision.entity';
import { Species } from '../species/species.entity';
import { Membership } from '../teams/membership.entity';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';
import { TeamSettings } from '../team-settings/team-settings.entity';
import { WaterAnalysis } from '../water-analyses/water-analysis.entity';
import { MassBalanceModel } from '../mass-balance/mass-balance-model.entity';
import { RockSample } from '../rock-samples/rock-sample.entity';
import { MineralFormula } from '../mineral-formulas/mineral-formula.entity';

/** Every entity, listed explicitly (no folder discovery: bundles and tsx both see the same list). */
export const ENTITIES = [
  User,
  Team,
  Membership,
  Invitation,
  RevokedToken,
  Species,
  ReactionSet,
  Reaction,
  NetReaction,
  Revision,
  ReviewComment,
  Publication,
  AuditEvent,
  TeamSettings,
  WaterAnalysis,
  MassBalanceModel,
  RockSample,
  MineralFormula,
];
