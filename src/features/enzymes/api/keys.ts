export const enzymeKeys = {
  all: ['enzymes'] as const,
  list: (filters: { teamId?: string } = {}) => [...enzymeKeys.all, 'list', filters] as const,
  detail: (id: string) => [...enzymeKeys.all, 'detail', id] as const,
};
