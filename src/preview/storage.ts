/**
 * Keeps the preview workbook in the browser's storage (localStorage): saved a moment after
 * each change (debounced, so a burst of edits is one write), saved again when the page is
 * hidden or closed, and read back when the page opens. A write that fails (storage full,
 * storage turned off, a private window that refuses it) is reported to the page, never
 * swallowed: the user is told the work is not being kept.
 */
import { isSavedWorkbook, SavedWorkbook } from './workbook';
import type { PreviewWorkbook } from './workbook';

/** The storage key of the workbook. */
export const STORAGE_KEY = 'proton-ledger.preview.workbook';
/** Quiet time after the last change before the workbook is written, ms: a burst of typing or a pasted block is one write. */
export const SAVE_DELAY_MS = 600;

/** What happened to the last save, for the page to show. */
export type SaveState = { readonly state: 'saved'; readonly bytes: number } | { readonly state: 'pending' } | { readonly state: 'failed'; readonly reason: string };

/** Why storage refused, in plain words. */
export function storageFailureReason(error: unknown): string {
  const name = (error as { name?: string } | null)?.name ?? '';
  if (name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED') return 'the browser\u2019s storage for this page is full';
  if (name === 'SecurityError') return 'this browser window does not allow pages to store data (a private window, or storage turned off)';
  return `the browser refused to store it (${(error as Error)?.message ?? String(error)})`;
}

/** The browser's localStorage, or the reason there is none. */
function storage(): Storage | string {
  try {
    const s = window.localStorage;
    if (!s) return 'this browser offers no storage to pages';
    return s;
  } catch (error) {
    return storageFailureReason(error);
  }
}

/** The saved workbook, null when there is none, or the reason it cannot be read. */
export function readSaved(): { saved: SavedWorkbook | null } | { failed: string } {
  const s = storage();
  if (typeof s === 'string') return { failed: s };
  let text: string | null;
  try {
    text = s.getItem(STORAGE_KEY);
  } catch (error) {
    return { failed: storageFailureReason(error) };
  }
  if (text === null) return { saved: null };
  try {
    const parsed: unknown = JSON.parse(text);
    return isSavedWorkbook(parsed) ? { saved: parsed } : { failed: 'the saved workbook is not in a layout this page reads' };
  } catch {
    return { failed: 'the saved workbook is damaged (not valid JSON)' };
  }
}

/** Forgets the saved workbook; returns the reason when storage refuses. */
export function clearSaved(): string | undefined {
  const s = storage();
  if (typeof s === 'string') return s;
  try {
    s.removeItem(STORAGE_KEY);
    return undefined;
  } catch (error) {
    return storageFailureReason(error);
  }
}

/** Saves a workbook after every change, a moment later. */
export class Autosave {
  private timer: ReturnType<typeof setTimeout> | undefined;
  private unsubscribe: () => void;
  private paused = false;

  constructor(
    private book: PreviewWorkbook,
    private readonly report: (state: SaveState) => void,
  ) {
    this.unsubscribe = book.onChange(() => this.schedule());
    const flush = () => {
      if (this.timer !== undefined) this.saveNow();
    };
    window.addEventListener('pagehide', flush);
    document.addEventListener('visibilitychange', () => {
      if (document.visibilityState === 'hidden') flush();
    });
  }

  /** Follows another workbook (after "New workbook" or opening a file) and saves it at once. */
  follow(book: PreviewWorkbook): void {
    this.unsubscribe();
    this.book = book;
    this.unsubscribe = book.onChange(() => this.schedule());
    this.saveNow();
  }

  /** Stops saving (while a workbook is being replaced). */
  pause(): void {
    this.paused = true;
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = undefined;
  }

  resume(): void {
    this.paused = false;
  }

  private schedule(): void {
    if (this.paused) return;
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.report({ state: 'pending' });
    this.timer = setTimeout(() => this.saveNow(), SAVE_DELAY_MS);
  }

  /** Writes the workbook now. */
  saveNow(): void {
    if (this.timer !== undefined) clearTimeout(this.timer);
    this.timer = undefined;
    if (this.paused) return;
    const s = storage();
    if (typeof s === 'string') return this.report({ state: 'failed', reason: s });
    try {
      const text = JSON.stringify(this.book.toSaved());
      s.setItem(STORAGE_KEY, text);
      this.report({ state: 'saved', bytes: text.length });
    } catch (error) {
      this.report({ state: 'failed', reason: storageFailureReason(error) });
    }
  }
}
