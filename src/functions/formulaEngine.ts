/**
 * The worksheet functions in HyperFormula, a formula engine that runs in Node and the
 * browser (GPL-3.0; licenceKey 'gpl-v3'). Every function of the generated metadata is
 * registered as `PROTON.<NAME>`, exactly as formulas are written in Excel, so a workbook's
 * formulas evaluate unchanged in the preview page and on the command line.
 *
 *   const hf = createFormulaEngine({ Sheet1: [['tris base', 50], ['NaCl', 150], ['=PROTON.PH.OF(A1:B2, 25)']] });
 *   hf.getCellValue({ sheet: 0, row: 2, col: 0 }); // 10.4…
 *
 * Errors come back as the engine's error values (#VALUE!, #N/A) with the message; nothing
 * is thrown through the engine.
 */
import { ArraySize, CellError, ConfigParams, ErrorType, FunctionArgumentType, FunctionPlugin, HyperFormula, ImplementedFunctions, SimpleRangeValue } from 'hyperformula';
import type { InterpreterState } from 'hyperformula/typings/interpreter/InterpreterState';
import type { InterpreterValue } from 'hyperformula/typings/interpreter/InterpreterValue';
import type { Ast, ProcedureAst } from 'hyperformula/typings/parser';
import { CATALOG, CatalogFunction, NAMESPACE, callFunction } from './catalog';
import { SheetError } from './errors';
import { SHEET_MESSAGES } from './messages';
import { spillShape } from './functions';

/** Licence key for HyperFormula under the GPL (without it every formula gives #LIC!). */
export const HYPERFORMULA_LICENSE_KEY = 'gpl-v3';

/** Engine name of a catalog function: `PROTON.PH.OF`. */
export function engineName(fn: CatalogFunction): string {
  return `${NAMESPACE}.${fn.id}`;
}

/** Plain value of an engine argument; a CellError is returned as is (to propagate it). */
function plain(value: unknown): unknown {
  if (value instanceof CellError) return value;
  if (typeof value === 'symbol') return null; // EmptyValue
  if (value !== null && typeof value === 'object' && typeof (value as { val?: unknown }).val === 'number') return (value as { val: number }).val; // dates, percentages
  return value;
}

function firstError(args: readonly unknown[]): CellError | undefined {
  for (const a of args) {
    if (a instanceof CellError) return a;
    if (Array.isArray(a)) for (const row of a) for (const v of row as unknown[]) if (v instanceof CellError) return v;
  }
  return undefined;
}

function toCellError(error: SheetError): CellError {
  return new CellError(error.kind === 'na' ? ErrorType.NA : ErrorType.VALUE, error.message);
}

/**
 * A spilled result padded with blank text to the size the engine gave it before computing
 * (HyperFormula sizes arrays at parse time, from spillShape). Excel needs no padding: the
 * functions return only the rows they have, and only this host pads.
 *
 * @param rows - the function's result
 * @param size - the array size the engine reserved
 * @returns the padded rows, or an error when the result does not fit (spillShape is an upper bound, so never expected)
 */
export function padToSpill(rows: readonly (readonly unknown[])[], size: { width: number; height: number }): (number | string | boolean)[][] | SheetError {
  const columns = Math.max(0, ...rows.map((r) => r.length));
  if (rows.length > size.height || columns > size.width) return new SheetError('value', SHEET_MESSAGES.resultLargerThanSpill(rows.length, columns, size.height, size.width));
  const out = rows.map((r) => [...r, ...new Array<string>(size.width - r.length).fill('')] as (number | string | boolean)[]);
  while (out.length < size.height) out.push(new Array<string>(size.width).fill(''));
  return out;
}

/** The plugin class: one method per catalog function, named after its position. */
class ProtonFunctionsPlugin extends FunctionPlugin {
  static implementedFunctions: ImplementedFunctions = {};

  protected evaluateCatalog(fn: CatalogFunction, ast: ProcedureAst, state: InterpreterState): InterpreterValue {
    return this.runFunction(ast.args, state, this.metadata(engineName(fn)), (...raw: unknown[]) => {
      const args = raw.map((v) => (v instanceof SimpleRangeValue ? v.data.map((row) => row.map(plain)) : plain(v)));
      const upstream = firstError(args);
      if (upstream) return upstream;
      const result = callFunction(fn, args);
      if (result instanceof SheetError) return toCellError(result);
      if (Array.isArray(result)) {
        const padded = padToSpill(result, this.spillSize(fn, ast, state));
        return padded instanceof SheetError ? toCellError(padded) : SimpleRangeValue.onlyValues(padded);
      }
      return result as number | string | boolean;
    }) as InterpreterValue;
  }

  protected spillSize(fn: CatalogFunction, ast: ProcedureAst, state: InterpreterState): ArraySize {
    const rows = fn.parameters.map((_p, i) => (i < ast.args.length && ast.args[i] !== undefined ? this.arraySizeForAst(ast.args[i] as Ast, state).height : 0));
    const shape = spillShape(fn.id, rows);
    return shape ? new ArraySize(shape.columns, shape.rows) : ArraySize.scalar();
  }
}

const prototype = ProtonFunctionsPlugin.prototype as unknown as Record<string, unknown>;
CATALOG.forEach((fn, i) => {
  const method = `catalog${i}`;
  prototype[method] = function (this: ProtonFunctionsPlugin, ast: ProcedureAst, state: InterpreterState) {
    return this['evaluateCatalog'](fn, ast, state);
  };
  const parameters = fn.parameters.map((p) => ({
    argumentType: p.dimensionality === 'matrix' ? FunctionArgumentType.RANGE : FunctionArgumentType.SCALAR,
    ...(p.optional ? { optionalArg: true } : {}),
  }));
  ProtonFunctionsPlugin.implementedFunctions[engineName(fn)] = fn.spills
    ? { method, parameters, sizeOfResultArrayMethod: `size${i}`, vectorizationForbidden: true }
    : { method, parameters };
  if (fn.spills) {
    prototype[`size${i}`] = function (this: ProtonFunctionsPlugin, ast: ProcedureAst, state: InterpreterState) {
      return this['spillSize'](fn, ast, state);
    };
  }
});

let registered = false;

/** Registers the plugin with HyperFormula (once per process; HyperFormula's registry is global). */
export function registerFormulaFunctions(): void {
  if (registered) return;
  const names: Record<string, string> = {};
  for (const fn of CATALOG) names[engineName(fn)] = engineName(fn);
  HyperFormula.registerFunctionPlugin(ProtonFunctionsPlugin, { enGB: names, enUS: names });
  registered = true;
}

/**
 * A HyperFormula instance with every PROTON function registered.
 *
 * @param sheets - sheet name → rows of cells (numbers, text, booleans, null, formulas as "=…")
 * @param config - more HyperFormula settings (the licence key is set, and smartRounding turned off, for you)
 * @returns the engine; read values with getCellValue / getSheetValues
 */
export function createFormulaEngine(sheets: Record<string, unknown[][]> = { Sheet1: [] }, config: Partial<ConfigParams> = {}): HyperFormula {
  registerFormulaFunctions();
  // smartRounding off: results come back exactly as computed, not rounded to 10 digits.
  return HyperFormula.buildFromSheets(sheets as Parameters<typeof HyperFormula.buildFromSheets>[0], { licenseKey: HYPERFORMULA_LICENSE_KEY, smartRounding: false, ...config });
}

const SAVED_NAMES = new Map(CATALOG.map((fn) => [`${NAMESPACE}_${fn.id.replace(/\./g, '_')}`, engineName(fn)]));

/**
 * A saved custom-function name followed by its bracket. The name is bounded (Excel's names
 * have at most 255 characters), so each occurrence costs at most that much to read and the
 * whole scan is linear in the formula's length, however the text is made.
 */
const SAVED_CALL = /_xldudf_([A-Za-z0-9_]{1,255})(?=[ \t\r\n]{0,255}\()/g;

function isPrefixChar(c: string): boolean {
  return /[A-Za-z0-9_.]/.test(c);
}

/**
 * Where an external reference before a saved name starts (`[1]!`, `'Other add-in.xlam'!`,
 * `Other.xla!`), or `at` when there is none. Reads back from `at` no further than `floor`
 * (the end of the text already written); each "!" is read back from once, so the reading
 * back is linear over the whole formula too.
 */
function externalPrefixStart(text: string, at: number, floor: number): number {
  const bang = at - 1;
  if (bang - 1 < floor || text[bang] !== '!') return at;
  const last = bang - 1;
  if (text[last] === ']') {
    let k = last - 1;
    while (k >= floor && text[k] >= '0' && text[k] <= '9') k--;
    return k < last - 1 && k >= floor && text[k] === '[' ? k : at;
  }
  if (text[last] === "'") {
    const open = text.lastIndexOf("'", last - 1);
    return open >= floor && open < last - 1 ? open : at;
  }
  let k = last;
  while (k >= floor && isPrefixChar(text[k])) k--;
  return k < last ? k + 1 : at;
}

/**
 * A formula as Excel saves it, made ready for the engine: Excel writes custom functions
 * as `_xldudf_PROTON_TITRANT_ML(` (dots become underscores), sometimes behind an external
 * reference that another add-in's registration left (`[1]!`, `Other.xla!`, `'Other add-in.xlam'!`;
 * reported in OfficeDev/office-js issues 2568 and 3872, not seen in a workbook of ours), and
 * newer built-ins as `_xlfn.NAME(`. Runs in time linear in the formula's length.
 *
 * @param formula - formula text, with or without the leading "="
 * @returns the formula with PROTON functions named as typed (`PROTON.TITRANT.ML(`)
 */
export function toEngineFormula(formula: string): string {
  let out = '';
  let written = 0;
  for (const m of formula.matchAll(SAVED_CALL)) {
    const name = SAVED_NAMES.get(m[1].toUpperCase());
    if (name === undefined || m.index! < written) continue;
    out += formula.slice(written, externalPrefixStart(formula, m.index!, written)) + name;
    written = m.index! + m[0].length;
  }
  return (out + formula.slice(written)).replace(/_xl(?:fn|ws)\./gi, '');
}
