/**
 * The messages at the foot of the window that say what just happened to the topic, a file, a
 * chart or the handout. Types only; `notices-en.ts` is the English. The state classes that act
 * (`TopicDocument`, `TopicSaving`, `TopicExports`) take them through their constructor.
 * `inBrowser` is true where a plain browser (not the desktop app) puts a saved file in its
 * downloads folder, so the message says where to look.
 */
import type { HandoutRefusalMessages } from '../../handout/messages/refusal-messages.ts';

export interface NoticeMessages {
  /** Appended when the topic replaced had unsaved changes, which are kept to restore. */
  readonly previousKept: string;
  /** Appended when an opening failed: nothing on screen changed. */
  readonly currentUnchanged: string;
  readonly opened: (fileName: string, replacing: string | null, migrated: boolean) => string;
  readonly openedExample: (title: string) => string;
  readonly started: string;
  readonly restored: (fileName: string | null, replacedKept: boolean) => string;
  readonly snapshotUnreadable: string;
  /** The topic could not be opened: the reason's own words, then that nothing changed. */
  readonly openFailed: (reason: string) => string;
  readonly topicSaved: (fileName: string, withPatient: boolean, inBrowser: boolean) => string;
  readonly topicNotSaved: (reason: string) => string;
  /** A topic is not written to a file while some of its numbers cannot be read (how many). */
  readonly numbersUnreadable: (count: number) => string;
  readonly chartSaved: (fileName: string, inBrowser: boolean) => string;
  readonly chartNotSaved: (reason: string) => string;
  readonly handoutNeedsResults: string;
  readonly handoutOpen: (fileName: string, inBrowser: boolean) => string;
  readonly handoutSaved: (fileName: string, inBrowser: boolean) => string;
  readonly handoutNotMade: (reason: string) => string;
  /** Why a handout was not made (it does not fit its page). */
  readonly handoutRefusal: HandoutRefusalMessages;
}
