/**
 * Excel entry: registers every function of the generated metadata with
 * CustomFunctions.associate. The only module of src/functions that knows Office; the
 * webpack side bundles it as the custom-functions script (metadata.json is served beside
 * it as functions.json, which Excel reads). It registers from associations.json, the id →
 * implementation list generated with metadata.json from the same JSDoc, so the bundle does
 * not carry the metadata a second time. Importing it outside Excel does nothing.
 */
import associations from './associations.json';
import { SheetError, toSheetError } from './errors';
import * as implementations from './functions';

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
  const byName = implementations as unknown as Record<string, (...args: unknown[]) => unknown>;
  for (const { id, functionName } of associations) {
    const implementation = byName[functionName];
    if (!implementation) throw new Error(`Function ${id} in associations.json has no implementation: run npm run metadata.`);
    api.associate(id, (...args: unknown[]) => {
      let result: unknown;
      try {
        result = implementation(...args);
      } catch (error) {
        throw toExcelError(api, toSheetError(error));
      }
      return result;
    });
  }
  return associations.map((a) => a.id);
}

if (typeof CustomFunctions !== 'undefined') registerExcelFunctions(CustomFunctions);
