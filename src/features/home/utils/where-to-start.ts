// "Where to start", per role: the first things to do in Bellwether, in the order the work goes
// (PRODUCT.md, "The workflow"). Shown in full while the teams hold no study yet, and in short
// beside the lists afterwards. Someone outside every team (admins aside) can only ask to join one.
import type { Role } from '@shared/permissions';
import { paths } from '@/config/paths';

export type StartStep = { title: string; text: string; href: string; linkLabel: string };

const enzyme: StartStep = {
  title: 'Register the enzyme and its variants',
  text: 'The parent (wild type) and each variant with its mutation list; preparations with lot and protein concentration.',
  href: paths.enzymes.href(),
  linkLabel: 'Enzymes',
};
const assay: StartStep = {
  title: 'Define the assay',
  text: 'Substrate and concentration, end point or kinetic, wavelength, extinction coefficient or standard curve, temperature.',
  href: paths.assayNew.href(),
  linkLabel: 'New assay',
};
const series: StartStep = {
  title: 'Design a buffer series',
  text: 'Pick the pH points; the designer proposes a buffer within one unit of each, marks weak capacity and prints the recipe sheet.',
  href: paths.bufferSeriesNew.href(),
  linkLabel: 'Design a series',
};
const study: StartStep = {
  title: 'Create a study',
  text: 'The assay, the buffer series and the variants; then lay out the plates, import the reader files and analyse.',
  href: paths.studyNew.href(),
  linkLabel: 'New study',
};
const review: StartStep = {
  title: 'Review submitted studies',
  text: 'Check the fits, the QC and the exclusions; approve (which locks the study) or return it with comments.',
  href: paths.studies.href(),
  linkLabel: 'Studies',
};
const compare: StartStep = {
  title: 'Compare variants',
  text: 'Overlay the profiles of approved studies, with each variant’s shift from the reference and its interval.',
  href: paths.comparisonNew.href(),
  linkLabel: 'New comparison',
};

const steps: Record<Role, StartStep[]> = {
  admin: [
    {
      title: 'Invite the people who will work here',
      text: 'Give each a role (admin, group lead, scientist or viewer) and a team. The invitation link works once, for 72 hours.',
      href: paths.people.href(),
      linkLabel: 'People',
    },
    {
      title: 'Set up teams and their members',
      text: 'Work belongs to a team: only its members, and admins, see it.',
      href: paths.teams.href(),
      linkLabel: 'Teams',
    },
    {
      title: 'Look after the buffer library',
      text: 'The buffer systems the designer proposes from, with their pKa values, temperature coefficients and sources.',
      href: paths.buffers.href(),
      linkLabel: 'Buffer library',
    },
    {
      title: 'Check who changed what',
      text: 'Every change is logged with its author, time and the record before and after.',
      href: paths.audit.href(),
      linkLabel: 'Audit log',
    },
  ],
  lead: [review, compare, enzyme, series, study],
  scientist: [enzyme, assay, series, study],
  viewer: [
    {
      title: 'Read your team’s studies',
      text: 'Their curves, fits, QC and review history; you change nothing.',
      href: paths.studies.href(),
      linkLabel: 'Studies',
    },
    {
      title: 'Open the comparisons',
      text: 'Variants side by side relative to a reference, as the group leads saved them.',
      href: paths.comparisons.href(),
      linkLabel: 'Comparisons',
    },
  ],
};

const noTeam: StartStep = {
  title: 'Ask an admin to add you to a team',
  text: 'Studies, profiles and comparisons belong to a team; until you are in one there is nothing here for you to read.',
  href: paths.teams.href(),
  linkLabel: 'Teams',
};

export function whereToStart(role: Role, inTeam: boolean): StartStep[] {
  if (!inTeam && role !== 'admin') return [noTeam];
  return steps[role];
}
