// Types of the reader-file parser: the public JSON format (README "Reader files") and the richer
// result the import screen uses (where each block sits, what was skipped, why values are missing).
import type { PlateFormat } from './wells';

export type { PlateFormat } from './wells';

/** Why a well value is missing. A missing value is null, never zero. */
export type WellFlag = 'saturated' | 'empty' | 'invalid';

// ---- The command-line format, key for key (see /shared/reference/README.md, "Reader files") ----

export interface EndpointBlockJson {
  kind: 'endpoint';
  plateFormat: PlateFormat;
  sheet: string;
  label: string;
  wells: Record<string, number | null>;
  flags: Record<string, WellFlag>;
}

export interface KineticBlockJson {
  kind: 'kinetic';
  plateFormat: PlateFormat;
  sheet: string;
  label: string;
  times_s: number[];
  wells: Record<string, (number | null)[]>;
  flags: Record<string, WellFlag>;
}

export type ReaderBlockJson = EndpointBlockJson | KineticBlockJson;

export interface ReaderFileJson {
  file: string;
  blocks: ReaderBlockJson[];
}

// ---- The richer library result ----

/** How the block was laid out in the file. */
export type BlockLayout = 'plate-grid' | 'wells-as-columns' | 'wells-as-rows' | 'long-table';

export interface BlockLocation {
  sheet: string;
  sheetIndex: number; // 0-based position of the sheet in the workbook (0 for text files)
  topLeft: string; // spreadsheet reference of the block's first cell, e.g. "B14"
  bottomRight: string;
  rows: number; // size of the block in the file, header included
  columns: number;
}

export interface Wavelengths {
  nm: number | null; // a single read wavelength (absorbance)
  excitationNm: number | null; // fluorescence pairs such as "Ex 485 / Em 520"
  emissionNm: number | null;
}

/** A missing point of a time course: which read, why, and what the cell held. */
export interface PointFlag {
  index: number;
  flag: WellFlag;
  raw: string;
}

export interface BlockDetail {
  layout: BlockLayout;
  location: BlockLocation;
  labelCell: string | null; // where the label was read; null when none was found
  wavelength: Wavelengths;
  /** Original text of each flagged end-point well ("OVER", ">3.5", "#DIV/0!", ""). */
  raw: Record<string, string>;
}

export interface ParsedEndpointBlock extends EndpointBlockJson {
  detail: BlockDetail;
}

export interface KineticDetail extends BlockDetail {
  /** How the times were written: 's', 'min', 'h', 'ms', 'm:ss', 'h:mm:ss', 'spreadsheet time' or 'mixed'. */
  timeSpelling: string;
  /** Temperatures from a temperature column (°C as written), skipped from the wells; null if none. */
  temperature: (number | null)[] | null;
  /** Every missing point of every well (a well's flag in `flags` is the most serious of these). */
  points: Record<string, PointFlag[]>;
}

export interface ParsedKineticBlock extends KineticBlockJson {
  detail: KineticDetail;
}

export type ParsedBlock = ParsedEndpointBlock | ParsedKineticBlock;

/** Something the parser noticed and the user may want to know (skipped columns, assumed units). */
export interface ParseNote {
  sheet?: string;
  cell?: string;
  message: string;
}

export interface ParsedReaderFile {
  file: string;
  fileType: 'xlsx' | 'text';
  /** Text files: the encoding and delimiter that were detected. */
  text?: { encoding: string; delimiter: ',' | ';' | '\t' };
  blocks: ParsedBlock[];
  notes: ParseNote[];
}

export type ParseErrorCode =
  | 'empty_file'
  | 'too_large'
  | 'too_many_sheets'
  | 'too_many_cells'
  | 'unsupported_type'
  | 'unreadable_workbook'
  | 'unreadable_text'
  | 'truncated'
  | 'invalid_time'
  | 'duplicate_time'
  | 'duplicate_well'
  | 'invalid_well'
  | 'nothing_found'
  | 'internal';

export interface ParseError {
  code: ParseErrorCode;
  message: string;
  sheet?: string;
  cell?: string;
  /** Near misses seen while looking (for 'nothing_found'): incomplete grids, tables without wells. */
  notes?: ParseNote[];
  /** The library's own words (exceljs, papaparse, JavaScript), for logs; not for the user. */
  technical?: string;
}

export type ParseResult = { ok: true; value: ParsedReaderFile } | { ok: false; error: ParseError };
