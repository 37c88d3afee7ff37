// "Where to start", per role: only what this version of Bellwether really offers. Later work
// replaces the home page with the dashboard of studies.
import type { Role } from '@shared/permissions';
import { paths } from '@/config/paths';

export type StartStep = { title: string; text: string; href: string; linkLabel: string };

const account: StartStep = {
  title: 'Keep your account safe',
  text: 'Change your password whenever you need to; your details and teams are listed there too.',
  href: paths.account.href(),
  linkLabel: 'Account',
};

const steps: Record<Role, StartStep[]> = {
  admin: [
    {
      title: 'Invite the people who will work here',
      text: 'Give each a role (admin, group lead, scientist or viewer) and, if you like, a team. They receive a link that works once, for 72 hours.',
      href: paths.people.href(),
      linkLabel: 'People',
    },
    {
      title: 'Set up teams and their members',
      text: 'Work belongs to a team: only its members, and admins, see it. A person may belong to several teams.',
      href: paths.teams.href(),
      linkLabel: 'Teams',
    },
    {
      title: 'Look after accounts',
      text: 'Change a role, or deactivate an account: the person can no longer sign in and their open sessions end.',
      href: paths.people.href(),
      linkLabel: 'People',
    },
    {
      title: 'Read the e-mail Bellwether sent',
      text: 'Invitations and password resets received by the local mail server, with their links.',
      href: paths.outbox.href(),
      linkLabel: 'Outbox',
    },
    {
      title: 'Check who changed what',
      text: 'Every change is logged with its author, time and the record before and after.',
      href: paths.audit.href(),
      linkLabel: 'Audit log',
    },
    account,
  ],
  lead: [
    {
      title: 'Meet your teams',
      text: 'See the teams you lead or belong to, and who is in each.',
      href: paths.teams.href(),
      linkLabel: 'Teams',
    },
    {
      title: 'Invite colleagues into your teams',
      text: 'Open a team and choose “Invite into this team”: you may invite group leads, scientists and viewers.',
      href: paths.teams.href(),
      linkLabel: 'Teams',
    },
    account,
  ],
  scientist: [
    {
      title: 'See your teams',
      text: 'The teams you belong to and their members. An admin adds you to teams; a group lead can invite colleagues.',
      href: paths.teams.href(),
      linkLabel: 'Teams',
    },
    account,
  ],
  viewer: [
    {
      title: 'See your teams',
      text: 'The teams you belong to and their members. As a viewer you read the team’s work and change nothing.',
      href: paths.teams.href(),
      linkLabel: 'Teams',
    },
    account,
  ],
};

export const whereToStart = (role: Role): StartStep[] => steps[role];
