export const bufferKeys = {
  all: ['buffers'] as const,
  list: () => [...bufferKeys.all, 'list'] as const,
  detail: (id: string) => [...bufferKeys.all, 'detail', id] as const,
};
