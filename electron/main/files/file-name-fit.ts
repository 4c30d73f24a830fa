import { createHash } from 'node:crypto';

/**
 * The longest file name the common file systems take: 255 bytes on ext4, XFS, Btrfs and
 * APFS, 255 UTF-16 units on NTFS (never more than 255 bytes of UTF-8). Common practice.
 */
export const MAX_NAME_BYTES = 255;

function utf8Bytes(text: string): number {
  return new TextEncoder().encode(text).byteLength;
}

/** The longest start of a text that fits a number of UTF-8 bytes, cut between characters. */
export function startWithin(text: string, maxBytes: number): string {
  let kept = '';
  let bytes = 0;
  for (const character of text) {
    const size = utf8Bytes(character);
    if (bytes + size > maxBytes) break;
    kept += character;
    bytes += size;
  }
  return kept;
}

/**
 * A name made of `before`, a file's own name and `after` (a temporary or backup name), at
 * most `maxBytes` long: when the whole would be longer, the file's name is cut and marked
 * with `~` and eight hex digits of its SHA-256, so two long names that start alike still get
 * names of their own. A legal name therefore never becomes unsaveable because of what the
 * app adds to it.
 */
export function nameWithin(before: string, name: string, after: string, maxBytes = MAX_NAME_BYTES): string {
  const whole = `${before}${name}${after}`;
  if (utf8Bytes(whole) <= maxBytes) return whole;
  const mark = `~${createHash('sha256').update(name).digest('hex').slice(0, 8)}`;
  const room = maxBytes - utf8Bytes(before) - utf8Bytes(after) - mark.length;
  return `${before}${startWithin(name, Math.max(0, room))}${mark}${after}`;
}
