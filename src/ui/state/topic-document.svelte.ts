/**
 * The topic the app holds and where it came from: opening a file (asked for, dropped on
 * the desktop app, or from the recent list), a new topic, an example, and unsaved work
 * from an earlier visit offered back. Opening never loses work: the topic it replaces
 * is a new document with its own undo history; unsaved work it replaces is kept and offered
 * back (as the earlier visit's is), and a file that cannot be read leaves the current topic alone.
 */
import { draftFromTopic } from '../draft/draft-from-topic.ts';
import { blankDraft } from '../draft/draft-edits.ts';
import type { BlankTopic } from '../draft/draft-edits.ts';
import { parseDraft } from '../draft/draft-schema.ts';
import { translatedCopy } from '../draft/translated-copy.ts';
import type { TopicDraft } from '../draft/topic-draft.ts';
import type { Catalogue } from '../../core/messages/describe.ts';
import { english } from '../../core/messages/en/index.ts';
import { openTopicText } from '../files/topic-files.ts';
import type { OpenedFile, Platform, PlatformDocument } from '../platform/platform.ts';
import { uiMessagesEn } from '../messages/en.ts';
import type { NoticeMessages } from '../messages/notice-messages.ts';
import type { AppBarMessages } from '../messages/ui-messages.ts';
import { noticeMessagesEn } from '../messages/notices-en.ts';
import type { AppMessages } from './app-messages.svelte.ts';
import { Autosave } from './autosave.ts';
import type { AutosaveRecord } from './autosave.ts';
import type { DemoTopic } from './demo-topics.ts';
import { RecentFiles } from './recent-files.ts';
import { TopicEditor } from './topic-editor.svelte.ts';
import type { EditorSettings } from './topic-editor.svelte.ts';

/** Where the earlier visit's unsaved work is kept while it is offered back. */
export const EARLIER_AUTOSAVE_KEY = 'chancewise.autosave.earlier.v1';

export interface TopicDocumentOptions {
  readonly platform: Platform;
  /** The examples; the first is the topic shown at start. */
  readonly demos: readonly DemoTopic[];
  readonly messages: AppMessages;
  /** The messages' words, in the interface's language; English when absent. */
  readonly words?: NoticeMessages;
  /** The core's problems in the interface's language (why a file cannot be read); English when absent. */
  readonly core?: Catalogue;
  /** The bar's words for where the topic is kept and the window's title; English when absent. */
  readonly labels?: AppBarMessages;
  /** The editor's clock and scheduler (tests); the autosave is the document's own. */
  readonly editor?: Omit<EditorSettings, 'autosave' | 'onAutosave' | 'fileName'>;
}

/** Where a file to open comes from: asked for, or (desktop menu) a path from the shell's recent list. */
export interface OpenSource {
  /** The recent file the person chose, to say so when they pick another. */
  readonly recentName?: string;
  readonly recentPath?: string;
}

/**
 * Where focus goes once another document is on screen: the decision's box of a new topic, or
 * the topic's heading of an opened one (so a keyboard user starts at its top, not the page's).
 */
export interface FocusRequest {
  readonly target: 'decision' | 'topic';
}

export class TopicDocument {
  readonly editor: TopicEditor;
  /** Unsaved work from an earlier visit or a crash, offered back until restored or discarded. */
  offer = $state.raw<AutosaveRecord | null>(null);
  recent = $state.raw<readonly string[]>([]);
  /** The start panel (new topic, files, examples) is open. */
  startOpen = $state(false);
  /** The latest request to move focus; a new object each time, so the same target can be asked twice. */
  focusRequest = $state.raw<FocusRequest | null>(null);

  readonly #platform: Platform;
  readonly #messages: AppMessages;
  readonly #words: NoticeMessages;
  readonly #core: Catalogue;
  readonly #labels: AppBarMessages;
  readonly #earlier: Autosave;
  readonly #recentFiles: RecentFiles;

  constructor(options: TopicDocumentOptions) {
    const { platform, demos } = options;
    this.#platform = platform;
    this.#messages = options.messages;
    this.#words = options.words ?? noticeMessagesEn;
    this.#core = options.core ?? english;
    this.#labels = options.labels ?? uiMessagesEn.appBar;
    const autosave = new Autosave(platform.storage);
    this.#earlier = new Autosave(platform.storage, EARLIER_AUTOSAVE_KEY);
    this.#recentFiles = new RecentFiles(platform.storage);
    const firstDemo = demos[0];
    const initial: TopicDraft = firstDemo === undefined ? blankDraft() : draftFromTopic(firstDemo.topic);
    // Unsaved work from an earlier visit is moved aside before this visit autosaves over it.
    const left = autosave.load();
    if (left !== null && left.unsaved && JSON.stringify(left.draft) !== JSON.stringify(initial)) this.#earlier.save(left);
    this.editor = new TopicEditor(initial, {
      ...options.editor,
      autosave,
      onAutosave: (record) => platform.snapshot(record.draft, record.unsaved),
    });
    this.offer = this.#earlier.load();
    this.recent = this.#recentFiles.list();
  }

  /** The window's title: an unsaved mark, the topic's decision, the app. */
  get windowTitle(): string {
    const { draft, hasUnsavedChanges } = this.editor;
    return this.#labels.windowTitle(draft.title.trim() === '' ? null : draft.title, hasUnsavedChanges);
  }

  /** Where the topic is kept: its file, or that it is an example or not saved yet. */
  get fileLabel(): string {
    const labels = this.#labels;
    return this.editor.fileName ?? (this.editor.draft.illustrative ? labels.exampleNotSaved : labels.notSavedYet);
  }

  /** The patient's name or reference is filled in. */
  get patientGiven(): boolean {
    const { draft } = this.editor;
    return draft.patientName.trim() !== '' || draft.patientReference.trim() !== '';
  }

  /** Put a file name at the top of the recent list. */
  remember(fileName: string): void {
    this.recent = this.#recentFiles.add(fileName);
  }

  /**
   * Put another document on screen. Unsaved work it replaces is kept as the offered work
   * (the newest replaced work takes the place of any offered before), so nothing typed is lost.
   */
  #replaceWith(
    draft: TopicDraft,
    settings: { readonly fileName: string | null; readonly saved: boolean },
    focus: FocusRequest['target'] = 'topic',
  ): boolean {
    const { editor } = this;
    const kept = editor.hasUnsavedChanges;
    if (kept) {
      const record: AutosaveRecord = {
        draft: editor.draft,
        fileName: editor.fileName,
        savedAt: new Date().toISOString(),
        unsaved: true,
      };
      this.#earlier.save(record);
      this.offer = record;
    }
    editor.load(draft, settings);
    this.startOpen = false;
    this.focusRequest = { target: focus };
    return kept;
  }

  #load(draft: TopicDraft, fileName: string | null, what: string, focus: FocusRequest['target'] = 'topic'): void {
    const kept = this.#replaceWith(draft, { fileName, saved: true }, focus);
    this.#messages.show({
      tone: 'info',
      text: `${what}${kept ? this.#words.previousKept : ''}`,
    });
  }

  /** Open an opened file's text; `replacing` names the recent file the person chose, when another came. */
  openText(picked: OpenedFile, replacing: string | null): void {
    const opened = openTopicText(picked.name, picked.text, { notices: this.#words, core: this.#core });
    if (!opened.ok) {
      this.#messages.show({ tone: 'error', text: this.#words.openFailed(opened.message) });
      return;
    }
    this.remember(opened.fileName);
    const other = replacing !== null && replacing !== opened.fileName ? replacing : null;
    this.#load(opened.draft, opened.fileName, this.#words.opened(opened.fileName, other, opened.migratedFrom !== null));
  }

  /** Open a file: by asking, or (desktop menu) a path from the shell's recent list. */
  async openFile(source: OpenSource = {}): Promise<void> {
    try {
      const platform = this.#platform;
      const picked =
        source.recentPath !== undefined ? await platform.openRecentTopicFile(source.recentPath) : await platform.openTopicFile();
      if (picked !== null) this.openText(picked, source.recentName ?? null);
    } catch (error) {
      this.#messages.fail(error, this.#words.openFailed);
    }
  }

  openDemo(demo: DemoTopic): void {
    this.#load(draftFromTopic(demo.topic), null, this.#words.openedExample(demo.topic.title));
    this.#platform.topicReplaced();
  }

  /** Start an empty topic, in English unless another patient language (and its comparison's name) is given. */
  newTopic(start?: BlankTopic): void {
    this.#load(blankDraft(start), null, this.#words.started, 'decision');
    this.#platform.topicReplaced();
  }

  /**
   * Put a copy of the topic on screen to be written in another language (a BCP 47 tag): a new,
   * unsaved document with the same numbers, every typed text kept and marked still to translate.
   * The topic copied is left as it is: its file is not touched, and unsaved changes to it are kept
   * above to restore, as when any other document replaces it.
   *
   * @param said - the message to show, in the interface's words
   */
  copyInLanguage(language: string, said: string): void {
    const copy = translatedCopy(this.editor.draft, language);
    const kept = this.#replaceWith(copy, { fileName: null, saved: false });
    this.#messages.show({
      tone: 'info',
      text: `${said}${kept ? this.#words.previousKept : ''}`,
    });
    this.#platform.topicReplaced();
  }

  /** Bring the offered unsaved work back, as unsaved and with its file; unsaved work it replaces is offered in its place. */
  restore(record: AutosaveRecord): void {
    this.#earlier.clear();
    this.offer = null;
    const kept = this.#replaceWith(record.draft, { fileName: record.fileName, saved: false });
    this.#messages.show({ tone: 'info', text: this.#words.restored(record.fileName, kept) });
  }

  discardOffer(): void {
    this.#earlier.clear();
    this.offer = null;
  }

  /** Documents the desktop shell hands over: a file to open, or the last snapshot after a crash. */
  receive(incoming: PlatformDocument): void {
    if (incoming.kind === 'file') {
      this.openText(incoming.file, null);
      return;
    }
    const draft = parseDraft(incoming.content);
    if (draft === null) {
      this.#messages.show({ tone: 'error', text: this.#words.snapshotUnreadable });
      return;
    }
    this.offer = { draft, fileName: incoming.fileName, savedAt: new Date().toISOString(), unsaved: true };
  }
}
