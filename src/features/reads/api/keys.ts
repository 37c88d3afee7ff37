export const readKeys = {
  all: ['reads'] as const,
  list: (plateId: string) => [...readKeys.all, 'list', plateId] as const,
  detail: (readId: string) => [...readKeys.all, 'detail', readId] as const,
};

/** The raw reader file, unchanged, as a download. */
export const rawFileHref = (fileId: string) => `/api/reader-files/${encodeURIComponent(fileId)}/raw`;
