/**
 * Saving the topic to a file: the browser needs a file name from the app, and a topic
 * with the patient's details asks whether to write them (they are left out unless the
 * person says so). A draft with numbers that cannot be read is not saved, with a message.
 */
import { suggestedFileName, topicFileText } from '../files/topic-files.ts';
import type { Platform } from '../platform/platform.ts';
import type { NoticeMessages } from '../messages/notice-messages.ts';
import { noticeMessagesEn } from '../messages/notices-en.ts';
import type { AppMessages } from './app-messages.svelte.ts';
import type { TopicDocument } from './topic-document.svelte.ts';

export type SaveMode = 'save' | 'save-as';

export class TopicSaving {
  /** The save dialog (file name, patient's details) is open. */
  dialogOpen = $state(false);
  mode = $state<SaveMode>('save');

  readonly #document: TopicDocument;
  readonly #platform: Platform;
  readonly #messages: AppMessages;
  readonly #words: NoticeMessages;

  /** `words` are the messages' words in the interface's language (English when absent). */
  constructor(document: TopicDocument, platform: Platform, messages: AppMessages, words: NoticeMessages = noticeMessagesEn) {
    this.#document = document;
    this.#platform = platform;
    this.#messages = messages;
    this.#words = words;
  }

  /** The name the dialog suggests: the file the topic came from, or one made from its decision. */
  get suggestedName(): string {
    return suggestedFileName(this.#document.editor.draft, this.#document.editor.fileName);
  }

  /** Whether the dialog asks for a file name (the desktop shell asks in its own dialog). */
  get asksName(): boolean {
    return !this.#platform.namesFilesItself;
  }

  /** Save: ask for a name (browser) or about the patient's details (when given), then write. */
  request(mode: SaveMode = 'save'): void {
    const text = topicFileText(this.#document.editor.draft, false, this.#words);
    if (!text.ok) {
      this.#messages.show({ tone: 'error', text: text.message });
      return;
    }
    this.mode = mode;
    if (this.asksName || this.#document.patientGiven) this.dialogOpen = true;
    else void this.save(this.suggestedName, false);
  }

  cancel(): void {
    this.dialogOpen = false;
  }

  /** Write the topic under `fileName` (given the topic-file ending when it has none). */
  async save(fileName: string, includePatient: boolean): Promise<void> {
    this.dialogOpen = false;
    const { editor } = this.#document;
    const text = topicFileText(editor.draft, includePatient, this.#words);
    if (!text.ok) {
      this.#messages.show({ tone: 'error', text: text.message });
      return;
    }
    const name = /\.(cwtopic|json)$/i.test(fileName) ? fileName : `${fileName}.cwtopic`;
    try {
      const saved = await this.#platform.saveTopicFile(text.text, name, this.mode);
      if (saved === null) return;
      editor.markSaved(saved);
      this.#document.remember(saved);
      const inBrowser = this.#platform.kind === 'browser';
      this.#messages.show({ tone: 'info', text: this.#words.topicSaved(saved, includePatient, inBrowser) });
    } catch (error) {
      this.#messages.fail(error, this.#words.topicNotSaved);
    }
  }
}
