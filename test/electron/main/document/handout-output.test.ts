// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { exportHandoutPdf, handoutFileName, printHandout } from '../../../../electron/main/document/handout-output.ts';
import type { PrintableContents } from '../../../../electron/main/document/handout-output.ts';

let base: string;

beforeEach(async () => {
  base = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-handout-'));
});

afterEach(async () => {
  await fs.rm(base, { recursive: true, force: true });
});

const pdfBytes = new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d, 0x31, 0x2e, 0x37]); // "%PDF-1.7"

describe('handoutFileName()', () => {
  it('adds ".pdf" only when the name does not end in it, in any case', () => {
    expect(handoutFileName('heart-handout')).toBe('heart-handout.pdf');
    expect(handoutFileName('heart-handout.pdf')).toBe('heart-handout.pdf');
    expect(handoutFileName('HEART.PDF')).toBe('HEART.PDF');
    expect(handoutFileName('heart.pdf.txt')).toBe('heart.pdf.txt.pdf');
  });
});

describe('exportHandoutPdf()', () => {
  it('starts the dialog in the documents folder with the suggested name, and writes the bytes where chosen', async () => {
    const target = path.join(base, 'chosen.pdf');
    const chooseHandoutSavePath = vi.fn(async () => target);
    const exported = await exportHandoutPdf(
      { suggestedName: 'heart-handout', bytes: pdfBytes },
      { chooseHandoutSavePath },
      '/home/nurse/Documents',
    );
    expect(chooseHandoutSavePath).toHaveBeenCalledWith(path.join('/home/nurse/Documents', 'heart-handout.pdf'));
    expect(exported).toEqual({ fileName: 'chosen.pdf' });
    expect(new Uint8Array(await fs.readFile(target))).toEqual(pdfBytes);
  });

  it('writes nothing when the dialog is cancelled', async () => {
    const exported = await exportHandoutPdf(
      { suggestedName: 'heart', bytes: pdfBytes },
      { chooseHandoutSavePath: async () => null },
      base,
    );
    expect(exported).toBeNull();
    expect(await fs.readdir(base)).toEqual([]);
  });

  it('reports a write that fails as write-failed', async () => {
    const target = path.join(base, 'no-such-folder', 'heart.pdf');
    await expect(
      exportHandoutPdf({ suggestedName: 'heart', bytes: pdfBytes }, { chooseHandoutSavePath: async () => target }, base),
    ).rejects.toMatchObject({
      code: 'write-failed',
    });
  });
});

describe('printHandout()', () => {
  const contentsAnswering = (
    success: boolean,
    failureReason: string,
  ): PrintableContents & { print: ReturnType<typeof vi.fn> } => ({
    print: vi.fn((_options: { printBackground: boolean }, callback: (success: boolean, failureReason: string) => void) => {
      callback(success, failureReason);
    }),
  });

  it('prints with backgrounds (the icon arrays are filled shapes)', async () => {
    const contents = contentsAnswering(true, '');
    expect(await printHandout(contents)).toEqual({ printed: true });
    expect(contents.print).toHaveBeenCalledWith({ printBackground: true }, expect.any(Function));
  });

  it('treats a cancelled print dialog as nothing printed, not as a failure', async () => {
    // Electron's webContents.print() reports a cancelled dialog as 'cancelled'; 'Print job canceled'
    // is the wording some Electron versions used (from memory).
    expect(await printHandout(contentsAnswering(false, 'cancelled'))).toEqual({ printed: false });
    expect(await printHandout(contentsAnswering(false, 'Print job canceled'))).toEqual({ printed: false });
  });

  it('reports any other failure as print-failed, with the reason', async () => {
    await expect(printHandout(contentsAnswering(false, 'failed'))).rejects.toMatchObject({
      code: 'print-failed',
      message: expect.stringContaining('(failed)'),
    });
  });
});
