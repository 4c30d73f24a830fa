/**
 * The demonstration topics shipped in assets/demo, read through the same file reader as
 * any opened file. The first (by file name, the one starting "01-") is the one the app
 * opens on, so it is part of the start-up script; the others are loaded when the Topics
 * panel lists them. Every file name is known at once, from the folder's listing.
 */
import { readTopicFile } from '../../core/topic/topic-file.ts';
import type { Topic } from '../../core/topic/topic.ts';

export interface DemoTopic {
  /** The file's name without folder, for example "01-kidney-stone.json". */
  readonly fileName: string;
  readonly topic: Topic;
}

const firstFile = import.meta.glob<string>('../../../assets/demo/01-*.json', {
  eager: true,
  query: '?raw',
  import: 'default',
});
const laterFiles = import.meta.glob<string>(['../../../assets/demo/*.json', '!../../../assets/demo/01-*.json'], {
  query: '?raw',
  import: 'default',
});

const baseName = (path: string): string => path.slice(path.lastIndexOf('/') + 1);
const pathsByName = new Map(
  [...Object.keys(firstFile), ...Object.keys(laterFiles)].sort().map((path) => [baseName(path), path] as const),
);

/** The file name of every demonstration topic, in order, before any of them is read. */
export const DEMO_FILE_NAMES: readonly string[] = [...pathsByName.keys()];

function demoFrom(fileName: string, text: string): DemoTopic | null {
  const reading = readTopicFile(text);
  return reading.ok ? { fileName, topic: reading.topic } : null;
}

const firstPath = Object.keys(firstFile)[0];
/** The topic the app opens on, or null when the first file is missing or does not read. */
export const FIRST_DEMO: DemoTopic | null =
  firstPath === undefined ? null : demoFrom(baseName(firstPath), firstFile[firstPath] ?? '');

/** The demonstration topic in the file `fileName`, or null when there is none or it does not read. */
export async function loadDemoTopic(fileName: string): Promise<DemoTopic | null> {
  const path = pathsByName.get(fileName);
  if (path === undefined) return null;
  if (FIRST_DEMO !== null && FIRST_DEMO.fileName === fileName) return FIRST_DEMO;
  const load = laterFiles[path];
  return load === undefined ? null : demoFrom(fileName, await load());
}

let loadingAll: Promise<readonly DemoTopic[]> | null = null;

/** Every demonstration topic that reads cleanly, in file-name order (read once, then kept; tried again after a failure). */
export function loadDemoTopics(): Promise<readonly DemoTopic[]> {
  loadingAll ??= Promise.all(DEMO_FILE_NAMES.map(loadDemoTopic)).then(
    (demos) => demos.filter((demo): demo is DemoTopic => demo !== null),
    (error: unknown) => {
      loadingAll = null;
      throw error;
    },
  );
  return loadingAll;
}
