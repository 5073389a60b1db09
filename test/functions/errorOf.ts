import { SheetError, toSheetError } from '../../src/functions/errors';

/** Runs a call and returns the spreadsheet error it raises (fails if it raises none). */
export function errorOf(call: () => unknown): SheetError {
  try {
    call();
  } catch (e) {
    return toSheetError(e);
  }
  throw new Error('expected an error');
}
