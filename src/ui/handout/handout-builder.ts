/**
 * Where the printed handout plugs in. The handout's PDF code is large (jsPDF and a
 * font), so it is loaded only when someone asks for a handout, from `src/pdf/build-handout.ts`.
 * That module is found at build time; while it does not exist the app offers no handout
 * and says so.
 *
 * The module must export `buildHandout(input: HandoutInput): Promise<Uint8Array> | Uint8Array`.
 */
import type { Topic } from '../../core/topic/topic.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';

/** Everything the handout is drawn from: the same topic and computed result as the screen. */
export interface HandoutInput {
  readonly topic: Topic;
  readonly result: TopicResult;
  /** Print the patient's name and reference (only when the clinician asks). */
  readonly includePatient: boolean;
  /** Show the NNT sentences on the handout (clinician choice). */
  readonly showNnt: boolean;
}

export interface HandoutModule {
  buildHandout(input: HandoutInput): Promise<Uint8Array> | Uint8Array;
}

// Not eager: Vite makes the module a separate chunk, fetched on first use only.
const modules = import.meta.glob<HandoutModule>('../../pdf/build-handout.ts');

/** True when this build contains the handout. */
export const HANDOUT_AVAILABLE = Object.keys(modules).length > 0;

/** Load the handout builder (once); null when this build has none. */
export async function loadHandoutBuilder(): Promise<HandoutModule | null> {
  const load = Object.values(modules)[0];
  if (load === undefined) return null;
  return load();
}
