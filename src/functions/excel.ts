/**
 * Excel entry: registers every function of the generated metadata with
 * CustomFunctions.associate. The only module of src/functions that knows Office; the
 * webpack side bundles it as the custom-functions script (metadata.json is served beside
 * it as functions.json). Importing it outside Excel does nothing.
 */
import { CATALOG, callFunction } from './catalog';
import { SheetError } from './errors';

/** The parts of the CustomFunctions global this entry uses (a stand-in can be passed in tests). */
export type CustomFunctionsApi = Pick<typeof CustomFunctions, 'associate' | 'Error' | 'ErrorCode'>;

/** The spreadsheet error as Excel wants it: #VALUE! or #N/A, each with its message. */
export function toExcelError(api: CustomFunctionsApi, error: SheetError): CustomFunctions.Error {
  const code = error.kind === 'na' ? api.ErrorCode.notAvailable : api.ErrorCode.invalidValue;
  return new api.Error(code, error.message);
}

/**
 * Registers every catalog function.
 *
 * @param api - the CustomFunctions global
 * @returns the ids registered
 */
export function registerExcelFunctions(api: CustomFunctionsApi): string[] {
  for (const fn of CATALOG) {
    api.associate(fn.id, (...args: unknown[]) => {
      const result = callFunction(fn, args);
      if (result instanceof SheetError) throw toExcelError(api, result);
      return result;
    });
  }
  return CATALOG.map((f) => f.id);
}

if (typeof CustomFunctions !== 'undefined') registerExcelFunctions(CustomFunctions);
