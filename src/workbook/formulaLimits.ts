/**
 * The limits every host keeps on one formula before the formula engine sees it: Excel's
 * own length and nesting (Microsoft, "Excel specifications and limits": 8,192 characters in
 * a formula, 64 levels of nesting) and a count of operators the engine can evaluate (it
 * evaluates a chain of operators by recursion, and its parser recurses per bracket: deep
 * nesting or a long chain overflows its stack). The command line's calc and the preview
 * page both check formulas here; docs/limits.md gives the measurements.
 */

/** Characters in one formula: Excel's limit. */
export const MAX_FORMULA_CHARS = 8_192;
/** Nesting of brackets in one formula: Excel's 64 levels of nested functions (the engine's parser recurses per level). */
export const MAX_FORMULA_DEPTH = 64;
/**
 * Operators (+ - * / ^ & = < >) in one formula. Excel has no such limit, but the formula
 * engine evaluates a chain of operators by recursion and ran out of stack between 1,000 and
 * 1,500 operators; 500 leaves room for nesting.
 */
export const MAX_FORMULA_OPERATORS = 500;

/** Deepest bracket nesting of a formula and its count of operators, outside its quoted texts and sheet names; one pass. */
export function formulaShape(formula: string): { depth: number; operators: number } {
  let depth = 0;
  let deepest = 0;
  let operators = 0;
  let quote = '';
  for (let i = 0; i < formula.length; i++) {
    const c = formula[i];
    if (quote) {
      if (c === quote) quote = '';
    } else if (c === '"' || c === "'") quote = c;
    else if (c === '(' || c === '{') deepest = Math.max(deepest, ++depth);
    else if (c === ')' || c === '}') depth = Math.max(0, depth - 1);
    else if ('+-*/^&=<>'.includes(c)) operators++;
  }
  return { depth: deepest, operators };
}

/** Which limit a formula passes, with the figures for the message. */
export type FormulaLimitBreach =
  | { readonly limit: 'length'; readonly value: number; readonly allowed: number }
  | { readonly limit: 'depth'; readonly value: number; readonly allowed: number }
  | { readonly limit: 'operators'; readonly value: number; readonly allowed: number };

/**
 * The first limit a formula passes, or undefined when it is within all of them.
 *
 * @param formula - the formula, with or without its leading "="
 * @example formulaLimitBreach('=' + '('.repeat(70) + '1' + ')'.repeat(70)) //=> { limit: 'depth', value: 70, allowed: 64 }
 */
export function formulaLimitBreach(formula: string): FormulaLimitBreach | undefined {
  if (formula.length > MAX_FORMULA_CHARS) return { limit: 'length', value: formula.length, allowed: MAX_FORMULA_CHARS };
  const { depth, operators } = formulaShape(formula.replace(/^=/, ''));
  if (depth > MAX_FORMULA_DEPTH) return { limit: 'depth', value: depth, allowed: MAX_FORMULA_DEPTH };
  if (operators > MAX_FORMULA_OPERATORS) return { limit: 'operators', value: operators, allowed: MAX_FORMULA_OPERATORS };
  return undefined;
}
