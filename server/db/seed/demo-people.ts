// The demo scenario (invented): Fennel Ridge Enzymology, a fictional feed-enzyme company, and its
// acid-tolerance team. Every name and address here is made up; addresses use example.org.
import type { Role } from '../../../shared/permissions';

export const demoPassword = 'fennel-ridge-demo';

export const demoTeam = {
  name: 'Acid tolerance',
  description: 'Fennel Ridge Enzymology (fictional): engineering the phytase FR1 to stay active at stomach-like pH. Demo data, generated.',
};

export const demoPeople: { email: string; name: string; role: Role; inTeam: boolean }[] = [
  { email: 'admin@example.org', name: 'Marit Holm', role: 'admin', inTeam: false },
  { email: 'lead@example.org', name: 'Daniel Osei', role: 'lead', inTeam: true },
  { email: 'scientist@example.org', name: 'Priya Raman', role: 'scientist', inTeam: true },
  { email: 'scientist2@example.org', name: 'Tomasz Wren', role: 'scientist', inTeam: true },
  { email: 'viewer@example.org', name: 'Elena Brandt', role: 'viewer', inTeam: true },
];
