import type { HandoutPdfRequest, SnapshotRequest } from './ipc-contract.ts';

/** Size limits of what the renderer may send (a topic file is a few kilobytes). */
export const PAYLOAD_LIMITS = {
  /** Characters of topic file text. */
  documentCharacters: 1_000_000,
  /** Characters of a snapshot's content written as JSON. */
  snapshotCharacters: 1_000_000,
  /** Nesting depth of a snapshot's content. */
  snapshotDepth: 32,
  /** Values (objects, arrays, strings, numbers...) in a snapshot's content. */
  snapshotValues: 100_000,
  /** Bytes of a handout PDF. */
  pdfBytes: 20 * 1024 * 1024,
  /** Characters of a suggested file name. */
  fileNameCharacters: 120,
  /** Characters of a path from the recent list. */
  pathCharacters: 4096,
} as const;

/** The outcome of checking one request's arguments. */
export type PayloadCheck<T> =
  | { readonly ok: true; readonly value: T }
  | { readonly ok: false; readonly code: 'invalid-request' | 'too-large' };

const INVALID = { ok: false, code: 'invalid-request' } as const;
const TOO_LARGE = { ok: false, code: 'too-large' } as const;

function accept<T>(value: T): PayloadCheck<T> {
  return { ok: true, value };
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) return false;
  const prototype: unknown = Object.getPrototypeOf(value);
  return prototype === Object.prototype || prototype === null;
}

function hasExactKeys(record: Record<string, unknown>, keys: readonly string[]): boolean {
  const own = Object.keys(record);
  return own.length === keys.length && keys.every((key) => Object.hasOwn(record, key));
}

/** Whether a request carries no arguments at all. */
export function checkNoArguments(args: readonly unknown[]): PayloadCheck<null> {
  return args.length === 0 ? accept(null) : INVALID;
}

/**
 * Whether a request carries exactly one topic file text: a non-empty string of at most a
 * million characters with no NUL (whether it is a valid topic is checked apart).
 */
export function checkDocumentText(args: readonly unknown[]): PayloadCheck<string> {
  if (args.length !== 1) return INVALID;
  const [text] = args;
  if (typeof text !== 'string' || text.length === 0 || text.includes('\u0000')) return INVALID;
  if (text.length > PAYLOAD_LIMITS.documentCharacters) return TOO_LARGE;
  return accept(text);
}

/** Whether a request carries exactly one path of the recent list's kind: a non-empty string without NUL. */
export function checkRecentPath(args: readonly unknown[]): PayloadCheck<string> {
  if (args.length !== 1) return INVALID;
  const [recentPath] = args;
  if (typeof recentPath !== 'string' || recentPath.length === 0 || recentPath.includes('\u0000')) return INVALID;
  if (recentPath.length > PAYLOAD_LIMITS.pathCharacters) return TOO_LARGE;
  return accept(recentPath);
}

/**
 * Whether a value is plain JSON data: null, booleans, finite numbers, strings, arrays and
 * plain objects only (no dates, maps, typed arrays, class instances), within the depth and
 * value-count limits. Returns 'too-large' when a limit is passed.
 */
export function checkPlainJson(value: unknown): 'ok' | 'invalid-request' | 'too-large' {
  let values = 0;
  const visit = (item: unknown, depth: number): 'ok' | 'invalid-request' | 'too-large' => {
    values += 1;
    if (values > PAYLOAD_LIMITS.snapshotValues || depth > PAYLOAD_LIMITS.snapshotDepth) return 'too-large';
    if (item === null || typeof item === 'boolean' || typeof item === 'string') return 'ok';
    if (typeof item === 'number') return Number.isFinite(item) ? 'ok' : 'invalid-request';
    if (Array.isArray(item)) {
      for (const element of item) {
        const result = visit(element, depth + 1);
        if (result !== 'ok') return result;
      }
      return 'ok';
    }
    if (!isPlainObject(item)) return 'invalid-request';
    for (const key of Object.keys(item)) {
      const result = visit(item[key], depth + 1);
      if (result !== 'ok') return result;
    }
    return 'ok';
  };
  return visit(value, 0);
}

/** Whether a request carries exactly one snapshot: `{ content, keepPatient, hasUnsavedChanges }`, content plain JSON. */
export function checkSnapshotRequest(args: readonly unknown[]): PayloadCheck<SnapshotRequest> {
  if (args.length !== 1) return INVALID;
  const [request] = args;
  if (!isPlainObject(request) || !hasExactKeys(request, ['content', 'keepPatient', 'hasUnsavedChanges'])) return INVALID;
  const { content, keepPatient, hasUnsavedChanges } = request;
  if (typeof keepPatient !== 'boolean' || typeof hasUnsavedChanges !== 'boolean') return INVALID;
  const shape = checkPlainJson(content);
  if (shape === 'invalid-request') return INVALID;
  if (shape === 'too-large') return TOO_LARGE;
  if (JSON.stringify(content).length > PAYLOAD_LIMITS.snapshotCharacters) return TOO_LARGE;
  return accept({ content, keepPatient, hasUnsavedChanges });
}

/**
 * Whether a file name is a plain name to suggest in a save dialog: 1 to 120 characters, no
 * folder separators, no control characters, none of Windows' reserved characters, and not
 * `.` or `..`.
 */
export function isPlainFileName(value: unknown): value is string {
  if (typeof value !== 'string' || value.length === 0 || value.length > PAYLOAD_LIMITS.fileNameCharacters) return false;
  if (value === '.' || value === '..') return false;
  return !/[\u0000-\u001f\u007f/\\:*?"<>|]/u.test(value);
}

const PDF_SIGNATURE = [0x25, 0x50, 0x44, 0x46, 0x2d]; // "%PDF-"

/** Whether a request carries exactly one handout PDF: `{ bytes, suggestedName }`, bytes starting "%PDF-". */
export function checkHandoutPdfRequest(args: readonly unknown[]): PayloadCheck<HandoutPdfRequest> {
  if (args.length !== 1) return INVALID;
  const [request] = args;
  if (!isPlainObject(request) || !hasExactKeys(request, ['bytes', 'suggestedName'])) return INVALID;
  const { bytes, suggestedName } = request;
  if (!(bytes instanceof Uint8Array) || !isPlainFileName(suggestedName)) return INVALID;
  if (bytes.byteLength > PAYLOAD_LIMITS.pdfBytes) return TOO_LARGE;
  if (!PDF_SIGNATURE.every((byte, index) => bytes[index] === byte)) return INVALID;
  return accept({ bytes, suggestedName });
}
