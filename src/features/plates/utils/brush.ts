// The brush: the role (and, if chosen, variant, pH point, replicate, concentration) that painting
// puts on wells. A field left undefined keeps what the well already has.
import type { WellRole } from '@shared/plate-map/schema';
import type { WellPatch } from './edit-map';

export type Brush = {
  role: WellRole;
  variantId?: string;
  point?: { pH: number; buffer: string | null };
  replicate?: number;
  concentrationUm?: number;
};

export const defaultBrush: Brush = { role: 'sample' };

export function brushPatch(brush: Brush): WellPatch {
  const patch: WellPatch = { role: brush.role };
  if (brush.variantId !== undefined) patch.variantId = brush.variantId;
  if (brush.point !== undefined) {
    patch.pH = brush.point.pH;
    patch.buffer = brush.point.buffer;
  }
  if (brush.replicate !== undefined) patch.replicate = brush.replicate;
  if (brush.concentrationUm !== undefined) patch.concentrationUm = brush.concentrationUm;
  return patch;
}
