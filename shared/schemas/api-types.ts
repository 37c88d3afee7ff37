// Response shapes the client and the server agree on.
import type { Permission, Role } from '../permissions';

export type TeamRef = { id: string; name: string };

export type Me = {
  id: string;
  email: string;
  name: string;
  role: Role;
  teams: TeamRef[];
  permissions: Permission[];
  csrfToken: string;
};

export type UserSummary = {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  createdAt: string;
  lastSignInAt: string | null;
  teams: TeamRef[];
};

export type TeamSummary = {
  id: string;
  name: string;
  description: string;
  createdAt: string;
  members: { id: string; name: string; email: string; role: Role }[];
};

export type InvitationView = { email: string; role: Role; teamName: string | null; expiresAt: string };

export type MailSummary = {
  id: string;
  receivedAt: string;
  sender: string;
  recipients: string[];
  subject: string;
};
export type MailMessage = MailSummary & { text: string; html: string | null };

export type AuditEntry = {
  id: number;
  at: string;
  actor: { id: string; name: string } | null;
  teamId: string | null;
  entity: string;
  entityId: string | null;
  action: string;
  before: unknown;
  after: unknown;
};

export type Page<T> = { items: T[]; total: number };
