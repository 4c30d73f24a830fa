/**
 * The app's state, composed: the topic document, saving, exports and the message, with
 * the keyboard shortcuts and the desktop shell's menu commands routed to them. The root
 * component draws this and hands it key presses and commands.
 */
import type { Catalogue } from '../../core/messages/describe.ts';
import type { NoticeMessages } from '../messages/notice-messages.ts';
import type { Platform, PlatformCommand } from '../platform/platform.ts';
import { AppMessages } from './app-messages.svelte.ts';
import type { Later } from './app-messages.svelte.ts';
import type { DemoTopic } from './demo-topics.ts';
import type { ShortcutAction } from './shortcuts.ts';
import { TopicDocument } from './topic-document.svelte.ts';
import type { TopicDocumentOptions } from './topic-document.svelte.ts';
import { TopicExports } from './topic-exports.svelte.ts';
import type { TopicExportsOptions } from './topic-exports.svelte.ts';
import { TopicSaving } from './topic-saving.svelte.ts';

export interface AppSessionOptions {
  readonly platform: Platform;
  readonly demos: readonly DemoTopic[];
  /** The document charts are drawn in for saving. */
  readonly document: Document;
  /** When information messages fade (tests). */
  readonly later?: Later;
  readonly editor?: TopicDocumentOptions['editor'];
  readonly loadMaker?: TopicExportsOptions['loadMaker'];
  readonly today?: TopicExportsOptions['today'];
  /** The words of the messages at the foot of the window, in the interface's language (English when absent). */
  readonly words?: NoticeMessages;
  /** The core's problems in the interface's language (English when absent). */
  readonly core?: Catalogue;
  /** The bar's words (where the topic is kept, the window's title); English when absent. */
  readonly labels?: TopicDocumentOptions['labels'];
}

export class AppSession {
  readonly messages: AppMessages;
  readonly topic: TopicDocument;
  readonly saving: TopicSaving;
  readonly exports: TopicExports;
  /** The teaching view is open over the editor. */
  teaching = $state(false);

  constructor(options: AppSessionOptions) {
    const { platform, words, core, labels } = options;
    this.messages = new AppMessages(options.later, words?.platform);
    this.topic = new TopicDocument({
      platform,
      demos: options.demos,
      messages: this.messages,
      editor: options.editor,
      words,
      core,
      labels,
    });
    this.saving = new TopicSaving(this.topic, platform, this.messages, words);
    this.exports = new TopicExports({
      editor: this.topic.editor,
      platform,
      messages: this.messages,
      document: options.document,
      loadMaker: options.loadMaker,
      today: options.today,
      words,
    });
    platform.connect({ command: (command) => this.command(command), document: (incoming) => this.topic.receive(incoming) });
  }

  /** Carry out a keyboard shortcut; returns whether it was taken (not while a dialog or the teaching view is open). */
  shortcut(action: ShortcutAction | null): boolean {
    if (action === null || this.saving.dialogOpen || this.teaching) return false;
    const { editor } = this.topic;
    if (action === 'undo') editor.undo();
    else if (action === 'redo') editor.redo();
    else if (action === 'save') this.saving.request();
    else void this.topic.openFile();
    return true;
  }

  /** Commands from the desktop shell's menu. */
  command(command: PlatformCommand): void {
    if (command.name === 'open-recent') void this.topic.openFile({ recentPath: command.recentPath });
    else if (command.name === 'new') this.topic.newTopic();
    else if (command.name === 'open') void this.topic.openFile();
    else if (command.name === 'save' || command.name === 'save-as') this.saving.request(command.name);
    else if (command.name === 'export-handout') void this.exports.makeHandout();
    else void this.exports.printHandout();
  }

  /** The window is closing: keep the work, and say whether there is unsaved work to warn about. */
  closing(): boolean {
    this.topic.editor.flushAutosave();
    return this.topic.editor.hasUnsavedChanges;
  }
}
