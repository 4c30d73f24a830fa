/**
 * Opening and saving topic files from the editor: reading gives a draft or one clear
 * message (and leaves the current topic alone); writing leaves the patient's details out
 * unless asked.
 */
import { describeProblem } from '../../core/messages/describe.ts';
import type { Catalogue } from '../../core/messages/describe.ts';
import { english } from '../../core/messages/en/index.ts';
import { readTopicFile, writeTopicFile } from '../../core/topic/topic-file.ts';
import { draftFromTopic } from '../draft/draft-from-topic.ts';
import { topicFromDraft } from '../draft/topic-from-draft.ts';
import type { TopicDraft } from '../draft/topic-draft.ts';
import type { NoticeMessages } from '../messages/notice-messages.ts';
import { noticeMessagesEn } from '../messages/notices-en.ts';
import { plainFileStem } from './plain-file-stem.ts';

/** The words a file's reading and writing say what went wrong in: the messages', and the core's problems. */
export interface TopicFileWords {
  readonly notices: NoticeMessages;
  readonly core: Catalogue;
}

const englishFileWords: TopicFileWords = { notices: noticeMessagesEn, core: english };

export const TOPIC_FILE_SUFFIX = '.cwtopic';

export type OpenedTopic =
  | { readonly ok: true; readonly draft: TopicDraft; readonly fileName: string; readonly migratedFrom: number | null }
  | { readonly ok: false; readonly message: string };

/** Read an opened file's text into a draft, or say in one sentence (in `words`, English when absent) why it cannot be opened. */
export function openTopicText(fileName: string, text: string, words: TopicFileWords = englishFileWords): OpenedTopic {
  if (text.trim() === '') return { ok: false, message: words.notices.fileEmpty(fileName) };
  const reading = readTopicFile(text);
  if (!reading.ok)
    return { ok: false, message: words.notices.fileUnreadable(fileName, describeProblem(reading.problem, words.core)) };
  return { ok: true, draft: draftFromTopic(reading.topic), fileName, migratedFrom: reading.migratedFrom };
}

export type SavedTopic = { readonly ok: true; readonly text: string } | { readonly ok: false; readonly message: string };

/** A draft as topic file text; patient details only when `includePatient` is set. */
export function topicFileText(draft: TopicDraft, includePatient: boolean, words: NoticeMessages = noticeMessagesEn): SavedTopic {
  const reading = topicFromDraft(draft);
  if (reading.problems.length > 0) return { ok: false, message: words.numbersUnreadable(reading.problems.length) };
  return { ok: true, text: writeTopicFile(reading.topic, { includePatient }) };
}

/** A file name for a draft: the file it came from, or its decision in plain letters, ending in .cwtopic. */
export function suggestedFileName(draft: TopicDraft, currentName: string | null): string {
  if (currentName !== null && currentName.endsWith(TOPIC_FILE_SUFFIX)) return currentName;
  if (currentName !== null && currentName.endsWith('.json'))
    return currentName.replace(/(\.chancewise)?\.json$/, TOPIC_FILE_SUFFIX);
  return `${plainFileStem(draft.title, 8, 'topic')}${TOPIC_FILE_SUFFIX}`;
}
