// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { addRecentFile, MAX_RECENT_FILES, parseRecentFiles } from '../../../../electron/main/document/recent-files.ts';

describe('addRecentFile()', () => {
  // Most recent first, no repeats, a short fixed length: common practice for recent-file menus.

  it('puts the file first, without repeats, and keeps at most ten', () => {
    expect(addRecentFile(['/a', '/b', '/c'], '/b')).toEqual(['/b', '/a', '/c']);
    const many = Array.from({ length: MAX_RECENT_FILES }, (_, index) => `/f${index}`);
    const added = addRecentFile(many, '/new');
    expect(added).toHaveLength(10);
    expect(added[0]).toBe('/new');
    expect(added).not.toContain('/f9');
  });
});

describe('parseRecentFiles()', () => {
  it('keeps absolute paths only, drops repeats and junk', () => {
    expect(parseRecentFiles(['/a.cwtopic', 'relative.cwtopic', 42, '/a.cwtopic', '/b\u0000.cwtopic', '', '/c.json'])).toEqual([
      '/a.cwtopic',
      '/c.json',
    ]);
    expect(parseRecentFiles({ files: ['/a'] })).toEqual([]);
    expect(parseRecentFiles(null)).toEqual([]);
  });
});
