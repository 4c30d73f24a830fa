/**
 * The demonstration topics shipped in assets/demo, read through the same file reader as
 * any opened file. The first (by file name) is the one the app opens on.
 */
import { readTopicFile } from '../../core/topic/topic-file.ts';
import type { Topic } from '../../core/topic/topic.ts';

export interface DemoTopic {
  /** The file's name without folder, for example "01-kidney-stone.json". */
  readonly fileName: string;
  readonly topic: Topic;
}

const files = import.meta.glob<string>('../../../assets/demo/*.json', { eager: true, query: '?raw', import: 'default' });

/** Every demonstration topic that reads cleanly, in file-name order. */
export const DEMO_TOPICS: readonly DemoTopic[] = Object.keys(files)
  .sort()
  .flatMap((path) => {
    const reading = readTopicFile(files[path] ?? '');
    return reading.ok ? [{ fileName: path.slice(path.lastIndexOf('/') + 1), topic: reading.topic }] : [];
  });
