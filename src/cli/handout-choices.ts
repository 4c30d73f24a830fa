/**
 * The choices `chancewise handout` prints with: each flag given on the command line, else
 * the topic file's stored choice (version 4 files keep them in `topic.handout`), else the
 * default (A4, no NNT sentences, the core's denominator).
 */
import type { TopicHandoutChoices } from '../core/topic/topic.ts';
import { DEFAULT_HANDOUT_CHOICES } from '../core/topic/topic.ts';
import type { WordsDenominator } from '../core/types.ts';
import type { Paper } from '../handout/paper-size.ts';

/** What the flags said; null where a flag was not given. */
export interface HandoutFlagChoices {
  readonly paper: Paper | null;
  readonly showNnt: boolean | null;
  readonly per: WordsDenominator | null;
}

export interface HandoutPrintChoices {
  readonly paper: Paper;
  readonly showNnt: boolean;
  readonly per: WordsDenominator | null;
}

/** The flags' choices over the stored ones. */
export function handoutChoices(flags: HandoutFlagChoices, stored: TopicHandoutChoices | undefined): HandoutPrintChoices {
  const base = stored ?? DEFAULT_HANDOUT_CHOICES;
  return { paper: flags.paper ?? base.paper, showNnt: flags.showNnt ?? base.showNnt, per: flags.per ?? base.per };
}
