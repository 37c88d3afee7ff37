import { z } from 'zod';
import { idSchema, paginationQuery } from './common';

export const auditQuerySchema = paginationQuery.extend({
  entity: z.string().trim().max(60).optional(),
  action: z.string().trim().max(60).optional(),
  actorId: idSchema.optional(),
  teamId: idSchema.optional(),
  entityId: z.string().trim().max(100).optional(),
  from: z.iso.datetime({ offset: true, message: 'Use an ISO date-time.' }).optional(),
  to: z.iso.datetime({ offset: true, message: 'Use an ISO date-time.' }).optional(),
});

export type AuditQuery = z.input<typeof auditQuerySchema>;

export const outboxQuerySchema = paginationQuery.extend({
  to: z.string().trim().max(254).optional(),
});
