/**
 * What the app makes from the topic on screen: a chart as SVG or PNG, and the printed
 * handout (PDF). Files are named for what they hold (`export-file-names.ts`); nothing is
 * made from results that are out of date.
 */
import type { ChartModel } from '../../render/chart-model.ts';
import { exportFileName, topicPart } from '../files/export-file-names.ts';
import { loadHandoutMaker, localDate } from '../handout/handout-builder.ts';
import type { HandoutMaker } from '../handout/handout-builder.ts';
import type { Platform } from '../platform/platform.ts';
import type { AppMessages } from './app-messages.svelte.ts';
import type { TopicDraft } from '../draft/topic-draft.ts';
import type { TopicEditor } from './topic-editor.svelte.ts';
import type { NoticeMessages } from '../messages/notice-messages.ts';
import { noticeMessagesEn } from '../messages/notices-en.ts';

export interface HandoutChoices {
  readonly paper: 'a4' | 'letter';
  readonly showNnt: boolean;
}

export interface TopicExportsOptions {
  readonly editor: TopicEditor;
  readonly platform: Platform;
  readonly messages: AppMessages;
  /** The document charts are drawn in for saving. */
  readonly document: Document;
  readonly loadMaker?: () => Promise<HandoutMaker>;
  readonly today?: () => Date;
  /** The messages' words, in the interface's language; English when absent. */
  readonly words?: NoticeMessages;
}

export class TopicExports {
  /** The handout is being made. */
  handoutBusy = $state(false);
  /** Warnings on the last handout made (typed text above the grade target), and the draft it was made from. */
  #warned = $state.raw<{ readonly draft: TopicDraft; readonly warnings: readonly string[] } | null>(null);
  readonly #options: TopicExportsOptions;

  constructor(options: TopicExportsOptions) {
    this.#options = options;
  }

  /** The start of every exported file's name: the topic file's, without its ending, or the decision's words. */
  #topicPart(): string {
    const { editor } = this.#options;
    return topicPart(editor.draft.title, editor.fileName);
  }

  get #words(): NoticeMessages {
    return this.#options.words ?? noticeMessagesEn;
  }

  /** The app cannot say itself where a saved file went (a browser's downloads). */
  get #inBrowser(): boolean {
    return this.#options.platform.kind === 'browser';
  }

  /** Save a chart; `showRange` keeps the outline of the people the interval leaves undecided. */
  async exportChart(model: ChartModel, format: 'svg' | 'png', showRange: boolean): Promise<void> {
    const { platform, document } = this.#options;
    const name = exportFileName(this.#topicPart(), model.outcomeName.trim() === '' ? model.id : model.outcomeName, format);
    try {
      // The export code is loaded on first use, so it stays out of the start-up script.
      const { chartPngFile, chartSvgFile } = await import('../export/chart-export.ts');
      const saved =
        format === 'svg'
          ? await platform.saveFile(name, chartSvgFile(model, document, { showRange }), 'image/svg+xml')
          : await platform.saveFile(name, await chartPngFile(model, document, { showRange }), 'image/png');
      if (saved !== null) this.#options.messages.show({ tone: 'info', text: this.#words.chartSaved(saved, this.#inBrowser) });
    } catch (error) {
      this.#options.messages.fail(error, this.#words.chartNotSaved);
    }
  }

  /** The handout's PDF of the results on screen, or null (with a message) when it cannot be made. */
  async #make(choices: HandoutChoices): Promise<Uint8Array | null> {
    const { editor, messages } = this.#options;
    const result = editor.shown;
    if (result === null) return null;
    const maker = await (this.#options.loadMaker ?? loadHandoutMaker)();
    const today = this.#options.today?.() ?? new Date();
    const made = await maker.makeHandout({
      topic: editor.check.topic,
      result,
      date: localDate(today),
      refusal: this.#words.handoutRefusal,
      ...choices,
    });
    this.#warned = made.ok ? { draft: editor.draft, warnings: made.warnings ?? [] } : null;
    if (made.ok) return made.pdf;
    messages.show({ tone: 'error', text: made.message });
    return null;
  }

  /**
   * Warnings on the last handout made: typed text that reads above the grade target (the handout
   * was still made). None once the topic has changed since, as they may no longer hold.
   */
  get handoutWarnings(): readonly string[] {
    const warned = this.#warned;
    return warned !== null && warned.draft === this.#options.editor.draft ? warned.warnings : [];
  }

  /** The topic's own handout choices (the desktop menu's handout and printing use them). */
  #choices(): HandoutChoices {
    const { handout } = this.#options.editor.draft;
    return { paper: handout.paper, showNnt: handout.showNnt };
  }

  /** Print the handout of the results on screen: in the system's PDF viewer, or a browser's new tab. */
  async printHandout(): Promise<void> {
    const { editor, platform, messages } = this.#options;
    if (editor.shown === null || editor.stale) {
      messages.show({ tone: 'error', text: this.#words.handoutNeedsResults });
      return;
    }
    this.handoutBusy = true;
    try {
      // Called at once, so a browser can open the handout's tab while the click still counts.
      const name = exportFileName(this.#topicPart(), 'handout', 'pdf');
      const shown = await platform.printHandout(name, () => this.#make(this.#choices()));
      if (shown !== null) messages.show({ tone: 'info', text: this.#words.handoutOpen(shown, this.#inBrowser) });
    } catch (error) {
      // The shell's and the browser's refusals say what failed and what to do in their own words.
      messages.fail(error);
    } finally {
      this.handoutBusy = false;
    }
  }

  /** Make the handout of the results on screen and save it; nothing while they are out of date. */
  async makeHandout(given: HandoutChoices | null = null): Promise<void> {
    const { editor, platform, messages } = this.#options;
    if (editor.shown === null || editor.stale) return;
    this.handoutBusy = true;
    try {
      const pdf = await this.#make(given ?? this.#choices());
      if (pdf === null) return;
      const saved = await platform.saveHandout(exportFileName(this.#topicPart(), 'handout', 'pdf'), pdf);
      if (saved !== null) messages.show({ tone: 'info', text: this.#words.handoutSaved(saved, this.#inBrowser) });
    } catch (error) {
      messages.fail(error, this.#words.handoutNotMade);
    } finally {
      this.handoutBusy = false;
    }
  }
}
