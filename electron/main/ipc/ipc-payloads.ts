import type { HandoutPdfRequest, SnapshotRequest } from '../../contract/ipc-contract.ts';

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
  { readonly ok: true; readonly value: T } | { readonly ok: false; readonly code: 'invalid-request' | 'too-large' };

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
 * million characters with no NUL (whether it is a valid topic is checked apart). The length
 * is checked first, in constant time, so an oversized text is refused without being scanned.
 */
export function checkDocumentText(args: readonly unknown[]): PayloadCheck<string> {
  if (args.length !== 1) return INVALID;
  const [text] = args;
  if (typeof text !== 'string') return INVALID;
  if (text.length > PAYLOAD_LIMITS.documentCharacters) return TOO_LARGE;
  if (text.length === 0 || text.includes('\u0000')) return INVALID;
  return accept(text);
}

/** Whether a request carries exactly one path of the recent list's kind: a non-empty string without NUL (length first). */
export function checkRecentPath(args: readonly unknown[]): PayloadCheck<string> {
  if (args.length !== 1) return INVALID;
  const [recentPath] = args;
  if (typeof recentPath !== 'string') return INVALID;
  if (recentPath.length > PAYLOAD_LIMITS.pathCharacters) return TOO_LARGE;
  if (recentPath.length === 0 || recentPath.includes('\u0000')) return INVALID;
  return accept(recentPath);
}

/**
 * Whether a value is plain JSON data: null, booleans, finite numbers, strings, arrays and
 * plain objects only (no dates, maps, typed arrays, class instances), within the depth,
 * value-count and character limits. Every string and key adds its length to a running
 * count, so a huge text is refused the moment it is met, before anything is written out as
 * JSON. Returns 'too-large' when a limit is passed.
 */
export function checkPlainJson(value: unknown): 'ok' | 'invalid-request' | 'too-large' {
  let values = 0;
  let characters = 0;
  const counted = (text: string): boolean => {
    characters += text.length;
    return characters <= PAYLOAD_LIMITS.snapshotCharacters;
  };
  const visit = (item: unknown, depth: number): 'ok' | 'invalid-request' | 'too-large' => {
    values += 1;
    if (values > PAYLOAD_LIMITS.snapshotValues || depth > PAYLOAD_LIMITS.snapshotDepth) return 'too-large';
    if (typeof item === 'string') return counted(item) ? 'ok' : 'too-large';
    if (item === null || typeof item === 'boolean') return 'ok';
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
      if (!counted(key)) return 'too-large';
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
 * Windows' reserved device names, alone or before an extension ("NUL.pdf" is the null
 * device too): Microsoft, "Naming Files, Paths, and Namespaces", Naming Conventions
 * ("CON, PRN, AUX, NUL, COM0-COM9 ... LPT0-LPT9 ... also avoid these names followed
 * immediately by an extension ... NUL.txt and NUL.tar.gz are both equivalent to NUL"),
 * including the superscript digits ¹ ² ³ it lists.
 */
const RESERVED_DEVICE_NAME = /^(?:con|prn|aux|nul|com[0-9¹²³]|lpt[0-9¹²³])\s*(?:\..*)?$/iu;

/**
 * Characters that change the direction text is shown in, so a name can read as another
 * ("handout<RLO>fdp.exe" shows as "handoutexe.pdf"): the explicit directional formatting
 * characters of Unicode Standard Annex #9 (§2: LRE, RLE, PDF, LRO, RLO, LRI, RLI, FSI, PDI)
 * and the marks LRM, RLM and ALM; also the byte order mark.
 */
const DIRECTION_CONTROLS = /[\u061c\u200e\u200f\u202a-\u202e\u2066-\u2069\ufeff]/u;

/**
 * Whether a file name is a plain name to suggest in a save dialog: 1 to 120 characters, no
 * folder separators, no control or direction-changing characters, none of Windows' reserved
 * characters or device names, not `.` or `..`, and not ending in a space or a dot (Windows
 * drops those, so the saved name would not be the one shown).
 */
export function isPlainFileName(value: unknown): value is string {
  if (typeof value !== 'string' || value.length === 0 || value.length > PAYLOAD_LIMITS.fileNameCharacters) return false;
  if (value === '.' || value === '..' || value.endsWith(' ') || value.endsWith('.')) return false;
  if (RESERVED_DEVICE_NAME.test(value.trimEnd()) || DIRECTION_CONTROLS.test(value)) return false;
  // eslint-disable-next-line no-control-regex -- control characters are exactly what this refuses
  return !/[\u0000-\u001f\u007f/\\:*?"<>|]/u.test(value);
}

const PDF_SIGNATURE = [0x25, 0x50, 0x44, 0x46, 0x2d]; // "%PDF-"

/** Whether a request carries exactly one handout PDF: `{ bytes, suggestedName }`, bytes starting "%PDF-". */
export function checkHandoutPdfRequest(args: readonly unknown[]): PayloadCheck<HandoutPdfRequest> {
  if (args.length !== 1) return INVALID;
  const [request] = args;
  if (!isPlainObject(request) || !hasExactKeys(request, ['bytes', 'suggestedName'])) return INVALID;
  const { bytes, suggestedName } = request;
  if (!(bytes instanceof Uint8Array)) return INVALID;
  if (bytes.byteLength > PAYLOAD_LIMITS.pdfBytes) return TOO_LARGE;
  if (!isPlainFileName(suggestedName)) return INVALID;
  if (!PDF_SIGNATURE.every((byte, index) => bytes[index] === byte)) return INVALID;
  return accept({ bytes, suggestedName });
}
