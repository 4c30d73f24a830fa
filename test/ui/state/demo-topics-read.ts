/**
 * Every demonstration topic, loaded once through the app's own loader, for the tests that
 * start the app or its parts on the examples.
 */
import { type DemoTopic, loadDemoTopics } from '../../../src/ui/state/demo-topics.ts';

export const DEMO_TOPICS: readonly DemoTopic[] = await loadDemoTopics();
