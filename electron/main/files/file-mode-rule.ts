/**
 * The one rule for the permission bits of every file the shell writes (topic files, their
 * backups and temporary files, handouts, snapshots, its own settings), since any of them can
 * hold patient details: a file that replaces or copies another keeps that file's bits, and a
 * file with no original is readable and writable by its owner only.
 */

/** Bits of a file with no original: owner read and write (0600). */
export const OWNER_ONLY_MODE = 0o600;

/** The permission bits for a file written from an original with `originalMode` (null: none). */
export function permissionBitsFor(originalMode: number | null): number {
  return originalMode === null ? OWNER_ONLY_MODE : originalMode & 0o777;
}
