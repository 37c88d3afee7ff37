// GET /api/buffer-series/:id/recipes.xlsx: the recipes as a workbook. The browser downloads it
// through an ordinary link (same-origin cookie), so there is no fetcher here, only the address.
export const recipesXlsxHref = (id: string) => `/api/buffer-series/${encodeURIComponent(id)}/recipes.xlsx`;
