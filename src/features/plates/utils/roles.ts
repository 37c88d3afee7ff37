// The role code of the editor: each role has its own well shape (filled disc, ring, dashed ring,
// square, crossed disc) and a letter, so roles read without colour; colour is kept for pH alone.
import { wellRoleLabels, wellRoles, type WellRole } from '@shared/plate-map/schema';

export { wellRoleLabels, wellRoles, type WellRole };

/** The key that sets a role in the grid, shown in the legend and the buttons. */
export const roleKeys: Record<WellRole, string> = {
  sample: 'S',
  blank: 'B',
  buffer: 'O',
  standard: 'T',
  unused: 'X',
};

export const roleByKey: Record<string, WellRole> = Object.fromEntries(
  wellRoles.map((role) => [roleKeys[role].toLowerCase(), role]),
);

export const roleHints: Record<WellRole, string> = {
  sample: 'filled disc, in the colour of its pH',
  blank: 'ring in the colour of its pH (no enzyme)',
  buffer: 'dashed ring in the colour of its pH',
  standard: 'grey square with its concentration',
  unused: 'crossed grey disc',
};
