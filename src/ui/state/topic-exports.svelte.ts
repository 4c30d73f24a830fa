/**
 * What the app makes from the topic on screen: a chart as SVG or PNG, and the printed
 * handout (PDF). Files are named for what they hold (`export-file-names.ts`); nothing is
 * made from results that are out of date.
 */
import type { ChartModel } from '../../render/chart-model.ts';
import { chartPngFile, chartSvgFile } from '../export/chart-export.ts';
import { exportFileName, topicPart } from '../files/export-file-names.ts';
import { loadHandoutMaker, localDate } from '../handout/handout-builder.ts';
import type { HandoutMaker } from '../handout/handout-builder.ts';
import type { Platform } from '../platform/platform.ts';
import type { AppMessages } from './app-messages.svelte.ts';
import type { TopicEditor } from './topic-editor.svelte.ts';

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
}

export class TopicExports {
  /** The handout is being made. */
  handoutBusy = $state(false);
  readonly #options: TopicExportsOptions;

  constructor(options: TopicExportsOptions) {
    this.#options = options;
  }

  /** The start of every exported file's name: the topic file's, without its ending, or the decision's words. */
  #topicPart(): string {
    const { editor } = this.#options;
    return topicPart(editor.draft.title, editor.fileName);
  }

  /** Where a saved file went, when the app cannot say it itself (a browser's downloads). */
  #where(): string {
    return this.#options.platform.kind === 'browser' ? ' Your browser puts it in its downloads folder.' : '';
  }

  /** Save a chart; `showRange` keeps the outline of the people the interval leaves undecided. */
  async exportChart(model: ChartModel, format: 'svg' | 'png', showRange: boolean): Promise<void> {
    const { platform, document } = this.#options;
    const name = exportFileName(this.#topicPart(), model.outcomeName.trim() === '' ? model.id : model.outcomeName, format);
    try {
      const saved =
        format === 'svg'
          ? await platform.saveFile(name, chartSvgFile(model, document, { showRange }), 'image/svg+xml')
          : await platform.saveFile(name, await chartPngFile(model, document, { showRange }), 'image/png');
      if (saved !== null)
        this.#options.messages.show({ tone: 'info', text: `The chart is saved as “${saved}”.${this.#where()}` });
    } catch (error) {
      this.#options.messages.fail('The chart could not be saved: ', error, '.');
    }
  }

  /** Make the handout of the results on screen and save it; nothing while they are out of date. */
  async makeHandout(given: HandoutChoices | null = null): Promise<void> {
    const { editor, platform, messages } = this.#options;
    // The desktop menu's handout is made with the topic's own choices.
    const choices = given ?? { paper: editor.draft.handout.paper, showNnt: editor.draft.handout.showNnt };
    const result = editor.shown;
    if (result === null || editor.stale) return;
    this.handoutBusy = true;
    try {
      const maker = await (this.#options.loadMaker ?? loadHandoutMaker)();
      const today = this.#options.today?.() ?? new Date();
      const made = await maker.makeHandout({ topic: editor.check.topic, result, date: localDate(today), ...choices });
      if (!made.ok) {
        messages.show({ tone: 'error', text: made.message });
        return;
      }
      const saved = await platform.saveHandout(exportFileName(this.#topicPart(), 'handout', 'pdf'), made.pdf);
      if (saved !== null)
        messages.show({ tone: 'info', text: `The handout is saved as “${saved}”.${this.#where()} Open it to print it.` });
    } catch (error) {
      messages.fail('The handout could not be made: ', error, '.');
    } finally {
      this.handoutBusy = false;
    }
  }
}
