/**
 * The one place where failures become spreadsheet errors.
 *
 * Catalog functions throw (SheetError from argument checks, ChemError from the core);
 * each host catches once, calls `toSheetError`, and turns the result into its own error
 * value: Excel a CustomFunctions.Error, HyperFormula a CellError. Only #VALUE! and #N/A
 * carry a message in Excel, so those are the only two kinds used.
 *
 * - invalid input → #VALUE! with the message naming the argument and what is allowed;
 * - a name not found (like a failed lookup), a pH that cannot be reached, or a solve that
 *   did not converge → #N/A with the message.
 */
import { ChemError } from '../chem';
import { SHEET_MESSAGES } from './messages';

/** The two error kinds that carry a message in Excel. */
export type SheetErrorKind = 'value' | 'na';

/** A failure to show in a cell: its kind, a message for the user, and where it came from. */
export class SheetError extends Error {
  readonly kind: SheetErrorKind;
  /** Stable code of the message (a key of the core's MESSAGES or of SHEET_MESSAGES). */
  readonly code: string;
  /** The argument or option at fault, as the user wrote it, when there is one. */
  readonly field?: string;
  /** What the field would accept, in words. */
  readonly allowed?: string;

  constructor(kind: SheetErrorKind, message: string, code = 'unexpected', field?: string, allowed?: string) {
    super(message);
    this.name = 'SheetError';
    this.kind = kind;
    this.code = code;
    this.field = field;
    this.allowed = allowed;
  }
}

/**
 * An invalid-argument error (#VALUE!).
 *
 * @param code - the message's code in its catalogue
 * @param field - the argument at fault
 * @param message - the message, from the catalogue
 * @param allowed - what the argument accepts, in words
 */
export function invalid(code: string, field: string | undefined, message: string, allowed?: string): SheetError {
  return new SheetError('value', message, code, field, allowed);
}

/**
 * Any thrown value as a SheetError.
 *
 * @param error - what a catalog function threw
 * @returns the spreadsheet error to show
 */
export function toSheetError(error: unknown): SheetError {
  if (error instanceof SheetError) return error;
  if (error instanceof ChemError) {
    const notFound = error.code === 'unknownSubstance';
    return new SheetError(error.kind === 'invalid-input' && !notFound ? 'value' : 'na', error.message, error.code, error.field, error.allowed);
  }
  const detail = error instanceof Error ? error.message : String(error);
  return new SheetError('value', SHEET_MESSAGES.unexpected(detail), 'unexpected');
}

/**
 * Re-throws a core error with the place it came from (argument and row) in front.
 *
 * @param error - thrown by the core or by coercion
 * @param argument - the argument it came from
 * @param row - the row of that range (1-based)
 */
export function withContext(error: unknown, argument: string, row: number): never {
  const message = (detail: string) => SHEET_MESSAGES.rowContext(argument, row, detail);
  if (error instanceof ChemError) throw new ChemError(error.kind, error.code, message(error.message), error.field, error.allowed);
  if (error instanceof SheetError) throw new SheetError(error.kind, message(error.message), error.code, error.field, error.allowed);
  throw error;
}
