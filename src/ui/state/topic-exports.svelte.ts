/**
 * What the app makes from the topic on screen: a chart as SVG or PNG, and the printed
 * handout (PDF). Files are named after the topic's file; nothing is made from results
 * that are out of date.
 */
import type { ChartModel } from '../../render/chart-model.ts';
import { chartPngFile, chartSvgFile } from '../export/chart-export.ts';
import { suggestedFileName } from '../files/topic-files.ts';
import { loadHandoutMaker, localDate } from '../handout/handout-builder.ts';
import type { HandoutMaker } from '../handout/handout-builder.ts';
import type { Platform } from '../platform/platform.ts';
import type { AppMessages } from './app-messages.svelte.ts';
import type { TopicEditor } from './topic-editor.svelte.ts';

export interface HandoutChoices {
  readonly paper: 'a4' | 'letter';
  readonly showNnt: boolean;
}

/** The handout the desktop menu asks for: A4, without the number-needed-to-treat sentences. */
export const MENU_HANDOUT: HandoutChoices = { paper: 'a4', showNnt: false };

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

  /** The start of every exported file's name: the topic file's, without its ending. */
  #baseName(): string {
    const { editor } = this.#options;
    return suggestedFileName(editor.draft, editor.fileName).replace(/\.chancewise\.json$/, '');
  }

  /** Save a chart; `showRange` keeps the outline of the people the interval leaves undecided. */
  async exportChart(model: ChartModel, format: 'svg' | 'png', showRange: boolean): Promise<void> {
    const { platform, document } = this.#options;
    const base = this.#baseName();
    try {
      if (format === 'svg') {
        await platform.saveFile(`${base}-${model.id}.svg`, chartSvgFile(model, document, { showRange }), 'image/svg+xml');
      } else {
        await platform.saveFile(`${base}-${model.id}.png`, await chartPngFile(model, document, { showRange }), 'image/png');
      }
    } catch (error) {
      this.#options.messages.fail('The chart could not be saved: ', error, '.');
    }
  }

  /** Make the handout of the results on screen and save it; nothing while they are out of date. */
  async makeHandout(choices: HandoutChoices = MENU_HANDOUT): Promise<void> {
    const { editor, platform, messages } = this.#options;
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
      const saved = await platform.saveHandout(`${this.#baseName()}-handout.pdf`, made.pdf);
      if (saved !== null) messages.show({ tone: 'info', text: `The handout is saved as “${saved}”. Open it to print it.` });
    } catch (error) {
      messages.fail('The handout could not be made: ', error, '.');
    } finally {
      this.handoutBusy = false;
    }
  }
}
