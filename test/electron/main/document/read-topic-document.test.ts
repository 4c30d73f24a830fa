// @vitest-environment node
import fs from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { isTopicFileText, readTopicDocument } from '../../../../electron/main/document/read-topic-document.ts';

const demo = fileURLToPath(new URL('../../../../assets/demo/01-kidney-stone.json', import.meta.url));
let folder: string;

beforeAll(async () => {
  folder = await fs.mkdtemp(path.join(os.tmpdir(), 'chancewise-read-'));
});

afterAll(async () => {
  await fs.rm(folder, { recursive: true, force: true });
});

// A file with bytes that are not UTF-8 is refused (Unicode Standard, §3.9 conformance: 0xE9 followed
// by '}' is an ill-formed sequence).
describe('readTopicDocument()', () => {
  it('reads a demo topic file with its modification time', async () => {
    const document = await readTopicDocument(demo);
    expect(document.text).toBe(await fs.readFile(demo, 'utf8'));
    expect(document.modifiedAt).toBe((await fs.stat(demo)).mtimeMs);
  });

  it('refuses a file that is not a topic, not UTF-8, a folder or missing', async () => {
    const notTopic = path.join(folder, 'a.cwtopic');
    await fs.writeFile(notTopic, '{"format":"something-else"}');
    await expect(readTopicDocument(notTopic)).rejects.toMatchObject({ code: 'not-a-topic-file' });
    const latin1 = path.join(folder, 'b.cwtopic');
    await fs.writeFile(latin1, Buffer.from([0x7b, 0xe9, 0x7d]));
    await expect(readTopicDocument(latin1)).rejects.toMatchObject({ code: 'not-a-topic-file' });
    await expect(readTopicDocument(folder)).rejects.toMatchObject({ code: 'read-failed' });
    await expect(readTopicDocument(path.join(folder, 'missing.cwtopic'))).rejects.toMatchObject({ code: 'read-failed' });
  });

  it('refuses a file larger than the limit before reading it', async () => {
    const big = path.join(folder, 'big.cwtopic');
    await fs.writeFile(big, Buffer.alloc(4_000_001, 0x20));
    await expect(readTopicDocument(big)).rejects.toMatchObject({ code: 'too-large' });
  });
});

describe('isTopicFileText()', () => {
  it('accepts the demo topic and refuses damaged text', async () => {
    const text = await fs.readFile(demo, 'utf8');
    expect(isTopicFileText(text)).toBe(true);
    expect(isTopicFileText(text.slice(0, 100))).toBe(false);
    expect(isTopicFileText('{}')).toBe(false);
  });
});
