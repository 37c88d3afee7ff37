// Limits that keep a hostile or broken file from exhausting the server. Plate-reader exports are
// far below all of them (a 384-well kinetic run of 120 reads is about 50,000 cells).
export const MAX_FILE_BYTES = 20 * 1024 * 1024;
export const MAX_SHEETS = 100;
/**
 * xlsx is a zip: refuse archives that unpack to far more than any reader export (zip bombs, and
 * sheets exceljs could not hold in memory). Measured here: 500,000 numeric cells are 15 MB of
 * sheet XML and take exceljs 4.4 about 270 MB of memory; a 384-well run of 1,000 reads is ~12 MB.
 */
export const MAX_UNPACKED_BYTES = 48 * 1024 * 1024;
/** The largest sheet a spreadsheet program allows (Excel: 1,048,576 rows × 16,384 columns). */
export const MAX_ROWS = 1_048_576;
export const MAX_COLUMNS = 16_384;
/** Filled cells over the whole file (about 1,000 reads of a full 384-well plate, times four). */
export const MAX_CELLS = 1_500_000;
/** How far the label search looks above or left of a block. */
export const LABEL_SEARCH_DISTANCE = 12;
