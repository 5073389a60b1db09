/**
 * Warnings: caveats about a result that is still a result (an error is raised instead when
 * there is none). Each carries a stable code and its message from the one catalogue
 * (errors.ts MESSAGES), so hosts show the message and tests and programs read the code;
 * nobody parses message text.
 */
import type { MessageCode } from './errors';

/** A caveat about a result: its code, its message, and the field or system it concerns when there is one. */
export interface ChemWarning {
  readonly code: MessageCode;
  readonly message: string;
  readonly field?: string;
}

/** A warning, from a message of the catalogue. */
export function warning(code: MessageCode, message: string, field?: string): ChemWarning {
  return field === undefined ? { code, message } : { code, message, field };
}

/** The messages of a list of warnings, in order (what a cell or a printed recipe shows). */
export function warningTexts(warnings: readonly ChemWarning[]): string[] {
  return warnings.map((w) => w.message);
}

/** A list without repeated messages (the same caveat reached two ways is said once). */
export function uniqueWarnings(warnings: readonly ChemWarning[]): ChemWarning[] {
  const seen = new Set<string>();
  return warnings.filter((w) => (seen.has(w.message) ? false : (seen.add(w.message), true)));
}
