// @vitest-environment node
import { describe, expect, it } from 'vitest';
import {
  checkDocumentText,
  checkHandoutPdfRequest,
  checkNoArguments,
  checkPlainJson,
  checkRecentPath,
  checkSnapshotRequest,
  isPlainFileName,
  PAYLOAD_LIMITS,
} from '../../../../electron/main/ipc/ipc-payloads.ts';

const pdfBytes = (length: number): Uint8Array => {
  const bytes = new Uint8Array(length);
  bytes.set([0x25, 0x50, 0x44, 0x46, 0x2d, 0x31, 0x2e, 0x37]); // "%PDF-1.7" (ISO 32000-1 §7.5.2 file header)
  return bytes;
};

// The size limits are the app's own (a topic file is a few kilobytes); exactness at the limit is what
// is checked, not the limit's value.
describe('checkNoArguments()', () => {
  it('accepts no arguments and refuses any', () => {
    expect(checkNoArguments([])).toEqual({ ok: true, value: null });
    expect(checkNoArguments([undefined])).toEqual({ ok: false, code: 'invalid-request' });
  });
});

describe('checkDocumentText()', () => {
  it('accepts one non-empty string', () => {
    expect(checkDocumentText(['{"format":"chancewise-topic"}'])).toEqual({ ok: true, value: '{"format":"chancewise-topic"}' });
  });

  it('refuses other types, extra arguments, empty text and NUL', () => {
    for (const args of [[], [42], [{ text: 'x' }], [null], [''], ['a', 'b'], ['a\u0000b'], [new String('x')]]) {
      expect(checkDocumentText(args)).toEqual({ ok: false, code: 'invalid-request' });
    }
  });

  it('refuses text over the limit as too large, and accepts text exactly at it', () => {
    expect(checkDocumentText(['x'.repeat(PAYLOAD_LIMITS.documentCharacters + 1)])).toEqual({ ok: false, code: 'too-large' });
    expect(checkDocumentText(['x'.repeat(PAYLOAD_LIMITS.documentCharacters)]).ok).toBe(true);
  });
});

describe('checkRecentPath()', () => {
  it('accepts one path string and refuses other shapes', () => {
    expect(checkRecentPath(['/home/a/t.cwtopic'])).toEqual({ ok: true, value: '/home/a/t.cwtopic' });
    expect(checkRecentPath([['/home/a/t.cwtopic']]).ok).toBe(false);
    expect(checkRecentPath(['/a\u0000b']).ok).toBe(false);
    expect(checkRecentPath(['/'.repeat(PAYLOAD_LIMITS.pathCharacters + 1)])).toEqual({ ok: false, code: 'too-large' });
  });
});

describe('checkPlainJson()', () => {
  it('accepts plain JSON data', () => {
    expect(checkPlainJson({ a: [1, 'two', null, true, { b: 2.5 }] })).toBe('ok');
    expect(checkPlainJson(Object.assign(Object.create(null) as object, { a: 1 }))).toBe('ok');
  });

  it('refuses values that are not plain data', () => {
    for (const value of [
      new Date(0),
      new Map(),
      new Set(),
      new Uint8Array(2),
      Number.NaN,
      Number.POSITIVE_INFINITY,
      undefined,
      () => 1,
      10n,
      Symbol('s'),
    ]) {
      expect(checkPlainJson({ value }), String(typeof value)).toBe('invalid-request');
    }
    class Draft {
      title = 'x';
    }
    expect(checkPlainJson(new Draft())).toBe('invalid-request');
  });

  it('calls deep nesting and huge collections too large', () => {
    let nested: unknown = 'leaf';
    for (let level = 0; level < PAYLOAD_LIMITS.snapshotDepth + 1; level += 1) nested = [nested];
    expect(checkPlainJson(nested)).toBe('too-large');
    expect(checkPlainJson(new Array(PAYLOAD_LIMITS.snapshotValues + 1).fill(0))).toBe('too-large');
  });
});

describe('checkSnapshotRequest()', () => {
  const content = { title: 'Illustrative topic', patientName: 'A. Person' };

  it('accepts exactly content, keepPatient and hasUnsavedChanges', () => {
    expect(checkSnapshotRequest([{ content, keepPatient: false, hasUnsavedChanges: true }])).toEqual({
      ok: true,
      value: { content, keepPatient: false, hasUnsavedChanges: true },
    });
  });

  it('refuses missing, extra or mistyped fields', () => {
    for (const request of [
      { content },
      { content, keepPatient: 'no', hasUnsavedChanges: true },
      { content, keepPatient: false, hasUnsavedChanges: 1 },
      { content, keepPatient: false, hasUnsavedChanges: true, path: '/etc/passwd' },
      { content: new Date(), keepPatient: false, hasUnsavedChanges: true },
      [content, false, true],
      'snapshot',
    ]) {
      expect(checkSnapshotRequest([request])).toEqual({ ok: false, code: 'invalid-request' });
    }
    expect(checkSnapshotRequest([])).toEqual({ ok: false, code: 'invalid-request' });
  });

  it('refuses content over the size limit as too large', () => {
    const big = { text: 'x'.repeat(PAYLOAD_LIMITS.snapshotCharacters) };
    expect(checkSnapshotRequest([{ content: big, keepPatient: false, hasUnsavedChanges: true }])).toEqual({
      ok: false,
      code: 'too-large',
    });
  });
});

describe('isPlainFileName()', () => {
  it('accepts plain names and refuses paths and reserved characters', () => {
    expect(isPlainFileName('statin-handout.pdf')).toBe(true);
    expect(isPlainFileName('Handout 12 May.pdf')).toBe(true);
    for (const value of [
      '',
      '.',
      '..',
      '../x.pdf',
      'a/b.pdf',
      'a\\b.pdf',
      'C:x.pdf',
      'a\u0000.pdf',
      'a\nb.pdf',
      'a?.pdf',
      'x'.repeat(121),
      7,
    ]) {
      expect(isPlainFileName(value), String(value)).toBe(false);
    }
  });
});

describe('checkHandoutPdfRequest()', () => {
  it('accepts PDF bytes with a plain suggested name', () => {
    const bytes = pdfBytes(64);
    expect(checkHandoutPdfRequest([{ bytes, suggestedName: 'handout.pdf' }])).toEqual({
      ok: true,
      value: { bytes, suggestedName: 'handout.pdf' },
    });
  });

  it('refuses bytes that are not a PDF, names that are paths, and other shapes', () => {
    expect(checkHandoutPdfRequest([{ bytes: new Uint8Array([1, 2, 3, 4, 5]), suggestedName: 'h.pdf' }]).ok).toBe(false);
    expect(checkHandoutPdfRequest([{ bytes: pdfBytes(16), suggestedName: '../../h.pdf' }]).ok).toBe(false);
    expect(checkHandoutPdfRequest([{ bytes: Array.from(pdfBytes(16)), suggestedName: 'h.pdf' }]).ok).toBe(false);
    expect(checkHandoutPdfRequest([{ bytes: pdfBytes(16) }]).ok).toBe(false);
    expect(checkHandoutPdfRequest([{ bytes: pdfBytes(16), suggestedName: 'h.pdf', folder: '/' }]).ok).toBe(false);
  });

  it('refuses a PDF over 20 MiB as too large', () => {
    expect(checkHandoutPdfRequest([{ bytes: pdfBytes(PAYLOAD_LIMITS.pdfBytes + 1), suggestedName: 'h.pdf' }])).toEqual({
      ok: false,
      code: 'too-large',
    });
  });
});
