// A typed failure thrown inside the parser and turned into { ok: false, error } at its edge.
import type { ParseError, ParseErrorCode, ParseNote } from './types';

export class ImportError extends Error {
  readonly code: ParseErrorCode;
  readonly sheet?: string;
  readonly cell?: string;
  readonly notes?: ParseNote[];
  /** The underlying library message, kept for logs (see ParseError.technical). */
  technical?: string;

  constructor(
    code: ParseErrorCode,
    message: string,
    where: { sheet?: string; cell?: string } = {},
    notes?: ParseNote[],
  ) {
    super(message);
    this.name = 'ImportError';
    this.code = code;
    this.sheet = where.sheet;
    this.cell = where.cell;
    this.notes = notes;
  }

  toParseError(): ParseError {
    const error: ParseError = { code: this.code, message: this.message };
    if (this.sheet !== undefined) error.sheet = this.sheet;
    if (this.cell !== undefined) error.cell = this.cell;
    if (this.notes && this.notes.length > 0) error.notes = this.notes;
    if (this.technical !== undefined) error.technical = this.technical;
    return error;
  }
}

/** "Sheet 'Kinetic', cell C14: " — the prefix every located message starts with. */
export function where(sheet: string, cell?: string): string {
  return cell ? `Sheet '${sheet}', cell ${cell}: ` : `Sheet '${sheet}': `;
}
