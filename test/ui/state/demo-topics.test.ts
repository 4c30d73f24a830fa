import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, test } from 'vitest';
import { readTopicFile } from '../../../src/core/topic/topic-file.ts';
import { DEMO_FILE_NAMES, FIRST_DEMO, loadDemoTopic, loadDemoTopics } from '../../../src/ui/state/demo-topics.ts';

const demoFolder = join(import.meta.dirname, '../../../assets/demo');
const filesOnDisk = readdirSync(demoFolder)
  .filter((name) => name.endsWith('.json'))
  .sort();

function readFromDisk(fileName: string) {
  const reading = readTopicFile(readFileSync(join(demoFolder, fileName), 'utf8'));
  if (!reading.ok) throw new Error(`${fileName} does not read`);
  return reading.topic;
}

describe('the demonstration topics', () => {
  test('the list knows every file name in file-name order before any file is loaded', () => {
    // Read at import, with nothing loaded yet: the names come from the folder's listing.
    expect(DEMO_FILE_NAMES).toEqual(filesOnDisk);
    expect(DEMO_FILE_NAMES.length).toBeGreaterThanOrEqual(5);
  });

  test('the topic the app opens on is the first file, read at start', () => {
    expect(FIRST_DEMO?.fileName).toBe(filesOnDisk[0]);
    expect(FIRST_DEMO?.topic).toEqual(readFromDisk(filesOnDisk[0] ?? ''));
  });

  test.each(filesOnDisk)('loading %s by name gives the topic the file reader reads from it', async (fileName) => {
    const demo = await loadDemoTopic(fileName);
    expect(demo?.fileName).toBe(fileName);
    expect(demo?.topic).toEqual(readFromDisk(fileName));
  });

  test('a name that is not one of the examples loads nothing', async () => {
    expect(await loadDemoTopic('99-not-there.json')).toBeNull();
  });

  test('loading them all gives every example in order, the first being the one opened at start', async () => {
    const demos = await loadDemoTopics();
    expect(demos.map((demo) => demo.fileName)).toEqual(filesOnDisk);
    expect(demos[0]).toBe(FIRST_DEMO);
    expect(demos[3]?.topic).toEqual(readFromDisk(filesOnDisk[3] ?? ''));
    expect(await loadDemoTopics()).toBe(demos);
  });
});
