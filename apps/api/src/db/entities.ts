import { RevokedToken } from '../auth/revoked-token.entity';
import { Invitation } from '../invitations/invitation.entity';
import { Membership } from '../teams/membership.entity';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';

/** Every entity, listed explicitly (no folder discovery: bundles and tsx both see the same list). */
export const ENTITIES = [User, Team, Membership, Invitation, RevokedToken];
