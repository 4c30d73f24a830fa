// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { exportHandoutPdf, handoutFileName, openHandoutForPrinting } from '../../../../electron/main/document/handout-output.ts';
import { shell } from '../../electron-mock.ts';

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

describe('openHandoutForPrinting(), with electron mocked', () => {
  beforeEach(() => {
    shell.openPath.mockReset();
  });

  it('writes the handout under its own name in a private folder and opens it in the system’s PDF viewer', async () => {
    shell.openPath.mockResolvedValue('');
    const folder = path.join(base, 'chancewise-print');
    const outcome = await openHandoutForPrinting({ suggestedName: 'heart-handout.pdf', bytes: pdfBytes }, shell, folder);
    const target = path.join(folder, 'heart-handout.pdf');
    expect(outcome).toEqual({ fileName: 'heart-handout.pdf' });
    expect(shell.openPath).toHaveBeenCalledWith(target);
    expect(new Uint8Array(await fs.readFile(target))).toEqual(pdfBytes);
    // Owner only: rwx------ (POSIX permission bits, common practice for private temporary folders).
    if (process.platform !== 'win32') expect((await fs.stat(folder)).mode & 0o777).toBe(0o700);
  });

  it('replaces an earlier copy, so printing twice opens the newest handout', async () => {
    shell.openPath.mockResolvedValue('');
    const folder = path.join(base, 'chancewise-print');
    await openHandoutForPrinting(
      { suggestedName: 'heart-handout.pdf', bytes: new Uint8Array([0x25, 0x50, 0x44, 0x46, 0x2d, 0x31]) },
      shell,
      folder,
    );
    await openHandoutForPrinting({ suggestedName: 'heart-handout.pdf', bytes: pdfBytes }, shell, folder);
    expect(new Uint8Array(await fs.readFile(path.join(folder, 'heart-handout.pdf')))).toEqual(pdfBytes);
    expect(shell.openPath).toHaveBeenCalledTimes(2);
  });

  it('keeps a name that tries to leave the folder inside it, and adds ".pdf" when missing', async () => {
    shell.openPath.mockResolvedValue('');
    const folder = path.join(base, 'chancewise-print');
    const outcome = await openHandoutForPrinting({ suggestedName: '../../evil', bytes: pdfBytes }, shell, folder);
    expect(outcome).toEqual({ fileName: 'evil.pdf' });
    expect(shell.openPath).toHaveBeenCalledWith(path.join(folder, 'evil.pdf'));
  });

  it('reports a system that cannot open the file as print-failed, with its reason', async () => {
    // Electron's shell.openPath resolves to an error message, or "" on success (Electron documentation, shell).
    shell.openPath.mockResolvedValue('No application knows how to open this file');
    await expect(
      openHandoutForPrinting({ suggestedName: 'heart.pdf', bytes: pdfBytes }, shell, path.join(base, 'p')),
    ).rejects.toMatchObject({
      code: 'print-failed',
      message: expect.stringContaining('(No application knows how to open this file)'),
    });
  });

  it('reports a folder that cannot be made as write-failed, and opens nothing', async () => {
    const blocker = path.join(base, 'a-file');
    await fs.writeFile(blocker, 'x');
    await expect(
      openHandoutForPrinting({ suggestedName: 'heart.pdf', bytes: pdfBytes }, shell, path.join(blocker, 'print')),
    ).rejects.toMatchObject({
      code: 'write-failed',
    });
    expect(shell.openPath).not.toHaveBeenCalled();
  });
});
