/**
 * The benchmark build's stand-in for `src/ui/state/demo-topics.ts`: one topic, the bench's
 * own fixture, read through the same file reader, so the app opens on it at start exactly
 * as it opens on the first example.
 */
import fixtureText from '../fixtures/bench-topic.chancewise.json?raw';
import { readTopicFile } from '../../src/core/topic/topic-file.ts';
import type { DemoTopic } from '../../src/ui/state/demo-topics.ts';

function fixtureTopics(): readonly DemoTopic[] {
  const reading = readTopicFile(fixtureText);
  if (!reading.ok) throw new Error(`the bench’s topic does not read (${reading.problem.code} at ${reading.problem.field})`);
  return [{ fileName: 'bench-topic.chancewise.json', topic: reading.topic }];
}

export const DEMO_TOPICS: readonly DemoTopic[] = fixtureTopics();
