import { z } from 'zod';
import { idSchema, optionalText, text } from './common';

export const teamCreateSchema = z.object({
  name: text(80, 'Team name'),
  description: optionalText(500, 'Description'),
});

export const teamMemberAddSchema = z.object({ userId: idSchema });
export const teamMemberParams = z.object({ id: idSchema, userId: idSchema });

export type TeamCreateInput = z.input<typeof teamCreateSchema>;
