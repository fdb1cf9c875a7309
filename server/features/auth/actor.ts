import type { Role } from '../../../shared/domain/roles';
import type { Team, User } from '../../../shared/schemas/auth';

/** The signed-in member a request acts for. */
export interface Actor {
  user: User;
  team: Team;
  role: Role;
  sessionVersion: number;
}

declare module 'express-serve-static-core' {
  interface Request {
    actor?: Actor;
  }
}
