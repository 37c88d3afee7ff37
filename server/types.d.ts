import 'express-session';
import type { Role } from '../shared/permissions';

declare module 'express-session' {
  interface SessionData {
    userId: string;
    csrfToken: string;
  }
}

declare global {
  namespace Express {
    interface Request {
      /** Set by the session middleware when the session belongs to an active user. */
      user?: CurrentUser;
    }
  }
}

export type CurrentUser = {
  id: string;
  email: string;
  name: string;
  role: Role;
  teamIds: string[];
};
