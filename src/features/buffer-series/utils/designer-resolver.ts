// react-hook-form resolver for the designer: the shared seriesInputSchema decides (through
// checkDesigner); its messages are placed on the fields the scientist typed into.
import { toNestErrors } from '@hookform/resolvers';
import type { FieldError, FieldErrors, Resolver } from 'react-hook-form';
import type { SeriesRequest } from '@shared/schemas/buffer-series';
import { checkDesigner, type DesignerValues } from './designer-values';

export const designerResolver: Resolver<DesignerValues, unknown, SeriesRequest> = async (
  values,
  _context,
  options,
) => {
  const checked = checkDesigner(values);
  if (checked.ok) return { values: checked.request, errors: {} };
  const flat: Record<string, FieldError> = {};
  for (const [name, message] of Object.entries(checked.errors)) flat[name] = { type: 'schema', message };
  return { values: {}, errors: toNestErrors(flat as FieldErrors, options) as FieldErrors<DesignerValues> };
};
