/**
 * The benchmark build's stand-in for `src/ui/state/demo-topics.ts`: one topic, the bench's
 * own fixture, read through the same file reader, so the app opens on it at start exactly
 * as it opens on the first example.
 */
import fixtureText from '../fixtures/bench-topic.chancewise.json?raw';
import { readTopicFile } from '../../src/core/topic/topic-file.ts';
import type { DemoTopic } from '../../src/ui/state/demo-topics.ts';

function fixtureTopic(): DemoTopic {
  const reading = readTopicFile(fixtureText);
  if (!reading.ok) throw new Error(`the bench’s topic does not read (${reading.problem.code} at ${reading.problem.field})`);
  return { fileName: 'bench-topic.chancewise.json', topic: reading.topic };
}

export const FIRST_DEMO: DemoTopic | null = fixtureTopic();
export const DEMO_FILE_NAMES: readonly string[] = [FIRST_DEMO.fileName];

export async function loadDemoTopic(fileName: string): Promise<DemoTopic | null> {
  return fileName === FIRST_DEMO?.fileName ? FIRST_DEMO : null;
}

export async function loadDemoTopics(): Promise<readonly DemoTopic[]> {
  return FIRST_DEMO === null ? [] : [FIRST_DEMO];
}
