import { describe, expect, it } from 'vitest';
import { fileIdentifier, pdfDate } from '../../src/handout/pdf-identity.ts';

describe('the creation date written into the file', () => {
  // ISO 32000-1:2008, 7.9.4: D:YYYYMMDDHHmmSSOHH'mm, O the relation to UT.
  it('is midnight universal time of the printed date, in the PDF date format', () => {
    expect(pdfDate('2026-12-01')).toBe("D:20261201000000+00'00'");
    expect(pdfDate('1999-01-31')).toBe("D:19990131000000+00'00'");
  });

  it('refuses anything but a YYYY-MM-DD date', () => {
    expect(() => pdfDate('1 December 2026')).toThrow(RangeError);
    expect(() => pdfDate('2026-12-1')).toThrow(RangeError);
  });
});

describe('the file identifier', () => {
  // FNV-1a 32-bit test vectors (Fowler, Noll and Vo, FNV reference test suite; from memory):
  // "" → 811c9dc5, "a" → e40c292c, "foobar" → bf9cf968. The first 8 digits are FNV-1a from its standard basis.
  it('starts with the FNV-1a hash of the text', () => {
    expect(fileIdentifier('').slice(0, 8)).toBe('811C9DC5');
    expect(fileIdentifier('a').slice(0, 8)).toBe('E40C292C');
    expect(fileIdentifier('foobar').slice(0, 8)).toBe('BF9CF968');
  });

  it('is 32 hexadecimal digits, the same for the same text and different for different text', () => {
    const first = fileIdentifier('Taking a tablet\n2026-12-01\na4\n0.1.0');
    expect(first).toMatch(/^[0-9A-F]{32}$/);
    expect(fileIdentifier('Taking a tablet\n2026-12-01\na4\n0.1.0')).toBe(first);
    expect(fileIdentifier('Taking a tablet\n2026-12-02\na4\n0.1.0')).not.toBe(first);
  });
});
