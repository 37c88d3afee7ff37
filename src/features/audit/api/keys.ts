import type { AuditFilters } from '../utils/audit-filters';

export const auditKeys = {
  all: ['audit'] as const,
  list: (filters: AuditFilters, page: { limit: number; offset: number }) =>
    [...auditKeys.all, 'list', filters, page] as const,
};
