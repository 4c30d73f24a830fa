/**
 * Where the printed handout plugs into the app. The handout's code is large (jsPDF and
 * two embedded font files), so `make-handout.ts` is imported only when someone asks for
 * a handout: Vite puts it, jsPDF and the fonts in chunks of their own.
 */
import type { Topic } from '../../core/topic/topic.ts';
import type { TopicResult } from '../../core/topic/topic-result.ts';
import type { HandoutRefusalMessages } from '../../handout/messages/refusal-messages.ts';

/** What the app asks the handout for: the very topic and result on screen, and the clinician's choices. */
export interface HandoutRequest {
  readonly topic: Topic;
  readonly result: TopicResult;
  readonly paper: 'a4' | 'letter';
  /** Print the number-needed-to-treat sentences (the clinician opts in). */
  readonly showNnt: boolean;
  /** The date printed on the sheet, YYYY-MM-DD. */
  readonly date: string;
  /** Why a handout was not made, in the interface's words (not the sheet's). */
  readonly refusal: HandoutRefusalMessages;
}

/**
 * A handout: the PDF bytes with any warnings (a typed title, population or question that reads
 * above the grade target; none when absent), or one sentence on why it could not be made.
 */
export type HandoutOutcome =
  | { readonly ok: true; readonly pdf: Uint8Array; readonly warnings?: readonly string[] }
  | { readonly ok: false; readonly message: string };

export interface HandoutMaker {
  makeHandout(request: HandoutRequest): Promise<HandoutOutcome>;
}

/** Load the handout code on first use. */
export function loadHandoutMaker(): Promise<HandoutMaker> {
  return import('./make-handout.ts');
}

/** Today as YYYY-MM-DD in the person's own time zone. */
export function localDate(today: Date): string {
  const pad = (value: number) => String(value).padStart(2, '0');
  return `${today.getFullYear()}-${pad(today.getMonth() + 1)}-${pad(today.getDate())}`;
}
