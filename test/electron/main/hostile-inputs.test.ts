// @vitest-environment node
// Smaller hostile inputs: an own "__proto__" key, reserved and direction-changing names, data:
// downloads from pages that are not the app's.
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { isPlainFileName } from '../../../electron/main/ipc/ipc-payloads.ts';
import { isOwnDownload } from '../../../electron/main/web/session-policy.ts';
import { parseSnapshotText, stripPatientFields } from '../../../electron/main/snapshot/snapshot-record.ts';
import { createSnapshotStore } from '../../../electron/main/snapshot/snapshot-store.ts';

const key = Buffer.alloc(32, 3);

describe('an own "__proto__" key in a snapshot', () => {
  // JSON.parse makes "__proto__" an own property (ECMA-262, JSON.parse uses CreateDataProperty),
  // and a structured clone keeps it; plain assignment would set the prototype instead.
  const content = JSON.parse('{"title":"T","__proto__":{"note":"kept","patientName":"Ann Example"}}') as unknown;

  it('keeps the subtree when patient fields are stripped', () => {
    const stripped = stripPatientFields(content);
    expect(JSON.stringify(stripped)).toBe('{"title":"T","__proto__":{"note":"kept","patientName":""}}');
    expect(Object.getPrototypeOf(stripped)).toBe(Object.prototype);
  });

  it('keeps it through a written and read snapshot', async () => {
    const folder = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-proto-'));
    try {
      const store = createSnapshotStore({ folder, key });
      const name = await store.write({ content, keepPatient: false, documentPath: null, savedAt: 5 });
      const record = parseSnapshotText(await fs.readFile(path.join(folder, name), 'utf8'), key);
      expect(JSON.stringify(record?.content)).toBe('{"title":"T","__proto__":{"note":"kept","patientName":""}}');
    } finally {
      await fs.rm(folder, { recursive: true, force: true });
    }
  });
});

describe('isPlainFileName() against reserved and misleading names', () => {
  it('refuses Windows device names, with or without an extension, in any case', () => {
    // Microsoft, "Naming Files, Paths, and Namespaces", Naming Conventions.
    for (const name of ['CON', 'con.pdf', 'Nul.pdf', 'aux', 'PRN.tar.gz', 'COM1.pdf', 'lpt9', 'COM¹.pdf']) {
      expect(isPlainFileName(name), name).toBe(false);
    }
    for (const name of ['console.pdf', 'null-handout.pdf', 'com10.pdf', 'auxiliary.pdf'])
      expect(isPlainFileName(name), name).toBe(true);
  });

  it('refuses direction controls that make a name read as another', () => {
    // Unicode Standard Annex #9, §2 (explicit directional formatting characters); "handout<RLO>fdp.exe"
    // is shown as "handoutexe.pdf".
    for (const name of ['handout\u202efdp.exe', 'a\u2066b.pdf', 'a\u200fb.pdf', 'a\u061cb.pdf', '\ufeffh.pdf']) {
      expect(isPlainFileName(name), JSON.stringify(name)).toBe(false);
    }
  });

  it('refuses names ending in a space or a dot, which Windows would change', () => {
    expect(isPlainFileName('handout.pdf ')).toBe(false);
    expect(isPlainFileName('handout.')).toBe(false);
  });
});

describe('isOwnDownload()', () => {
  const page = (url: string) => ({ getURL: () => url });

  it("allows a data: download only from a page on the app's own origin", () => {
    expect(isOwnDownload('data:application/pdf;base64,JVBERi0=', page('app://chancewise/index.html'))).toBe(true);
    expect(isOwnDownload('data:application/pdf;base64,JVBERi0=', page('https://example.org/'))).toBe(false);
    expect(isOwnDownload('data:text/plain,x', page('app://chancewise.evil/'))).toBe(false);
    expect(isOwnDownload('data:text/plain,x', undefined)).toBe(false);
  });

  it("allows a blob download only of the app's own origin, and nothing else", () => {
    expect(isOwnDownload('blob:app://chancewise/5f1c', undefined)).toBe(true);
    expect(isOwnDownload('blob:https://example.org/5f1c', page('app://chancewise/index.html'))).toBe(false);
    expect(isOwnDownload('https://example.org/setup.exe', page('app://chancewise/index.html'))).toBe(false);
  });
});
