/**
 * The messages at the foot of the window that say what just happened to the topic, a file, a
 * chart or the handout. Types only; `notices-en.ts` is the English. The state classes that act
 * (`TopicDocument`, `TopicSaving`, `TopicExports`) take them through their constructor.
 * `inBrowser` is true where a plain browser (not the desktop app) puts a saved file in its
 * downloads folder, so the message says where to look.
 */
import type { HandoutRefusalMessages } from '../../handout/messages/refusal-messages.ts';

/** What a platform failure says, with what to do (see `platform/platform-failure.ts`). */
export interface PlatformFailureMessages {
  readonly tabBlocked: string;
  /** Sizes in megabytes (decimal, 1 MB = 1,000,000 bytes). */
  readonly fileTooLarge: (fileName: string, megabytes: number, limitMegabytes: number) => string;
}

export interface NoticeMessages {
  /** Appended when the topic replaced had unsaved changes, which are kept to restore. */
  readonly previousKept: string;
  readonly opened: (fileName: string, replacing: string | null, migrated: boolean) => string;
  readonly openedExample: (title: string) => string;
  readonly started: string;
  readonly restored: (fileName: string | null, replacedKept: boolean) => string;
  readonly snapshotUnreadable: string;
  /** An opened file holds nothing. */
  readonly fileEmpty: (fileName: string) => string;
  /** An opened file is not a topic that reads: `why` is the core's problem, in the interface's words. */
  readonly fileUnreadable: (fileName: string, why: string) => string;
  /** The topic cannot be written to a file while `count` numbers cannot be read. */
  readonly numbersUnreadable: (count: number) => string;
  /** The topic could not be opened: the reason's own words, then that nothing changed. */
  readonly openFailed: (reason: string) => string;
  readonly topicSaved: (fileName: string, withPatient: boolean, inBrowser: boolean) => string;
  readonly topicNotSaved: (reason: string) => string;
  readonly chartSaved: (fileName: string, inBrowser: boolean) => string;
  readonly chartNotSaved: (reason: string) => string;
  readonly handoutNeedsResults: string;
  readonly handoutOpen: (fileName: string, inBrowser: boolean) => string;
  readonly handoutSaved: (fileName: string, inBrowser: boolean) => string;
  readonly handoutNotMade: (reason: string) => string;
  readonly platform: PlatformFailureMessages;
  /** Why a handout was not made (it does not fit its page). */
  readonly handoutRefusal: HandoutRefusalMessages;
}
