/**
 * The catalog as hosts see it: every function of the generated metadata with its
 * implementation, found through the generated id → name associations (no hand-written
 * list of names), and one way to call any of them that never throws.
 */
import * as implementations from './functions';
import associations from './associations.json';
import metadata from './metadata.json';
import { SheetError, toSheetError } from './errors';

/** A parameter as the metadata describes it. */
export interface ParameterInfo {
  readonly name: string;
  readonly description?: string;
  readonly type: string;
  readonly dimensionality?: string;
  readonly optional?: boolean;
}

/** One worksheet function. */
export interface CatalogFunction {
  /** Id and name as in the metadata (e.g. `TITRANT.ML`); in Excel it carries the namespace: `PROTON.TITRANT.ML`. */
  readonly id: string;
  readonly name: string;
  readonly description: string;
  readonly helpUrl: string;
  readonly parameters: readonly ParameterInfo[];
  /** True when the result is a range that spills. */
  readonly spills: boolean;
  readonly implementation: (...args: unknown[]) => unknown;
}

/** The metadata, as generated (what Excel loads). */
export const FUNCTIONS_METADATA = metadata;

/** The namespace the add-in's manifest gives the functions; the formula engine and the command line use it too. */
export const NAMESPACE = 'PROTON';

const byName = implementations as unknown as Record<string, (...args: unknown[]) => unknown>;

/** Every function of the catalog, in metadata order. */
export const CATALOG: readonly CatalogFunction[] = metadata.functions.map((f) => {
  const association = associations.find((a) => a.id === f.id);
  const implementation = association ? byName[association.functionName] : undefined;
  if (!implementation) throw new Error(`Function ${f.id} in metadata.json has no implementation: run npm run metadata.`);
  return {
    id: f.id,
    name: f.name,
    description: f.description,
    helpUrl: f.helpUrl,
    parameters: f.parameters,
    spills: (f.result as { dimensionality?: string }).dimensionality === 'matrix',
    implementation,
  };
});

/** A cell result: a value, a spilled range, or an error to show. */
export type CellResult = number | string | boolean | readonly (readonly unknown[])[] | SheetError;

/**
 * Calls a catalog function; a failure comes back as a SheetError, never thrown.
 *
 * @param fn - the function
 * @param args - arguments as the host holds them (numbers, text, booleans, null for blank, 2-D arrays for ranges)
 */
export function callFunction(fn: CatalogFunction, args: readonly unknown[]): CellResult {
  try {
    return fn.implementation(...args) as CellResult;
  } catch (error) {
    return toSheetError(error);
  }
}

/** A function by id or name, case-insensitive, with or without the `PROTON.` prefix. */
export function findFunction(name: string): CatalogFunction | undefined {
  const key = name.toUpperCase().replace(new RegExp(`^${NAMESPACE}\\.`), '');
  return CATALOG.find((f) => f.id === key);
}
