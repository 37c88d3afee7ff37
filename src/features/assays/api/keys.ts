export const assayKeys = {
  all: ['assays'] as const,
  list: (filters: { teamId?: string } = {}) => [...assayKeys.all, 'list', filters] as const,
  detail: (id: string) => [...assayKeys.all, 'detail', id] as const,
};
