/**
 * The one-page patient handout as a PDF: content from the computed topic and the
 * wording module, laid out to fit one page of A4 or US Letter, drawn with jsPDF
 * in an embedded open font. Pure: the fonts, the date and the version come in as
 * arguments, so the browser app and the command line build the same bytes.
 */
import { jsPDF } from 'jspdf';
import type { Topic } from '../core/topic/topic.ts';
import type { TopicResult } from '../core/topic/topic-result.ts';
import type { Notice } from '../core/types.ts';
import { type Readability, readability } from '../core/wording/readability.ts';
import { type ReadingLevel, readabilityFor } from '../core/wording/reading-scale.ts';
import { typedTextWarnings } from '../core/wording/typed-texts.ts';
import { type ChartPalette, colourPalette } from '../render/palette.ts';
import { drawPage } from './draw-page.ts';
import { FIT_LADDER, type FitSettings } from './fit-settings.ts';
import { type HandoutContent, handoutContent } from './handout-content.ts';
import { type HandoutFonts, codePointsOf, registerFonts } from './handout-fonts.ts';
import { type HandoutWords, englishHandoutWords, readingLanguageOf } from './handout-words.ts';
import type { HandoutPart } from './messages/handout-messages.ts';
import { handoutRefusalMessagesEn } from './messages/refusal-messages.ts';
import type { HandoutRefusalMessages } from './messages/refusal-messages.ts';
import { type PageLayout, type PageMode, layoutPage } from './page-layout.ts';
import { type Paper, contentBox } from './paper-size.ts';
import { fileIdentifier, pdfDate } from './pdf-identity.ts';
import { jsPdfMeasure } from './text-layout.ts';

export interface HandoutOptions {
  /** Default A4. */
  readonly paper?: Paper;
  /** The date printed on the sheet and written as the file's creation date, YYYY-MM-DD. */
  readonly date: string;
  /** The app's version, printed in the footer. */
  readonly appVersion: string;
  /** Print the number-needed-to-treat sentences (off by default). */
  readonly showNnt?: boolean;
  /** The clinician or practice printed in the footer, in place of the topic's. */
  readonly clinician?: string;
  readonly palette?: ChartPalette;
  /**
   * The sheet's one language: the sentences, the pictures' words and every other string, and
   * (from `words.handout.language`) the PDF's document language and the readability scale.
   * English when absent.
   */
  readonly words?: HandoutWords;
  /** The clinician's words for a refusal (the interface's language, not the sheet's). English when absent. */
  readonly refusal?: HandoutRefusalMessages;
}

/** A handout that was built. */
export interface HandoutBuilt {
  readonly ok: true;
  /** The PDF file. */
  readonly pdf: Uint8Array;
  readonly paper: Paper;
  readonly pages: number;
  /**
   * Flesch Reading Ease and Flesch–Kincaid grade of the sheet's sentences (not the table, chart
   * labels or footer). English formulas: they mean something only for an English sheet; every
   * sheet's level on its own language's scale is `readingScale`.
   */
  readonly readability: Readability;
  /**
   * The same prose on the scale of the sheet's language: the Flesch–Kincaid grade with its limit
   * for English, the Szigriszt-Pazos perspicuity on the INFLESZ scale with its target for Spanish.
   */
  readonly readingScale: ReadingLevel;
  /** The type sizes and spacing the content fitted with. */
  readonly settings: FitSettings;
  /** Whether every outcome's pictures were printed (all or none). */
  readonly pictures: boolean;
  /** Whether those pictures are the compact ones (one smaller scale, the key once; see `PageMode`). */
  readonly compactPictures: boolean;
  /** The size of every outcome's sentences, in points: the body size, or the list size when the page is tight. */
  readonly sentenceSize: number;
  /** Every sentence taken from the wording module, as printed. */
  readonly wordingSentences: readonly string[];
  /** The prose the readability was computed from, block by block. */
  readonly prose: readonly string[];
  /** A warning for each typed title, population or question that misses the target of the sheet's scale (never a refusal). */
  readonly readingWarnings: readonly Notice[];
}

/** A handout that does not fit on one page: nothing was drawn. */
export interface HandoutRefused {
  readonly ok: false;
  readonly reason: 'does-not-fit';
  /** What to shorten. */
  readonly part: HandoutPart;
  /** How far over the page the most compact layout still was, in millimetres (0 when a word is too wide for its column). */
  readonly overMillimetres: number;
  /** One line for the clinician, in the interface's words (`refusal`). */
  readonly message: string;
}

export type HandoutBuild = HandoutBuilt | HandoutRefused;

/** The sheet's prose, block by block, for the readability score (the captions under pictures left out, as the chart's labels). */
function proseOf(content: HandoutContent, pictures: boolean, short: boolean): string[] {
  return [
    content.title,
    ...content.audience,
    content.keyIntro,
    ...content.outcomes.flatMap((outcome) => [
      outcome.label,
      // Under pictures the frames are captions, like the chart's labels; without them they lead the paragraphs.
      ...(pictures ? [] : outcome.frames.map((frames) => frames.join(' '))),
      ...(short ? outcome.shortParagraphs : outcome.paragraphs)
        .filter((paragraph) => paragraph.length > 0)
        .map((paragraph) => paragraph.join(' ')),
      ...outcome.assumptions,
    ]),
    ...(content.screening?.items ?? []),
    [content.evidence.heading, ...content.evidence.items].join(' '),
    content.matters.prompt,
    ...content.questions.items,
    `${content.caution.heading} ${content.caution.text}`,
  ];
}

/**
 * Build the handout of a computed topic: one page, or a refusal saying what to
 * shorten. With the same inputs the bytes are the same.
 *
 * @param result - the computed topic (its denominator, period and rounded counts)
 * @param topic - the topic it came from (title, evidence, questions, clinician)
 * @param options - paper, date, version and what to show
 * @param fonts - the regular and bold faces from `handoutFonts`
 * @throws RangeError when the date is not a YYYY-MM-DD date from 1970 to 2037 (the PDF date range jsPDF writes)
 * @example buildHandout(result, topic, { date: '2026-12-01', appVersion: '0.1.0' }, fonts).ok // => true
 */
export function buildHandout(result: TopicResult, topic: Topic, options: HandoutOptions, fonts: HandoutFonts): HandoutBuild {
  const paper = options.paper ?? 'a4';
  const words = options.words ?? englishHandoutWords;
  const messages = words.handout;
  const language = readingLanguageOf(messages);
  const palette = options.palette ?? colourPalette;
  const creationDate = pdfDate(checkedDate(options.date));
  const content = handoutContent(result, topic, {
    date: options.date,
    appVersion: options.appVersion,
    showNnt: options.showNnt === true,
    clinician: options.clinician ?? '',
    words,
  });

  const doc = new jsPDF({
    unit: 'mm',
    format: paper,
    orientation: 'portrait',
    compress: true,
    putOnlyUsedFonts: true,
    // Hundredths of a point (0.004 mm): far finer than any printer, and a fraction of the size of jsPDF's default 16 digits.
    precision: 2,
    floatPrecision: 2,
  });
  // Every character the page sets; the chart models and close-ups are left out, their pictures have no text (and many people).
  const closeUpLabels = content.outcomes.map((outcome) => outcome.pictures.closeUp?.label ?? null);
  const textOnly = content.outcomes.map((outcome, index) => ({
    ...outcome,
    pictures: { ...outcome.pictures, model: null, closeUp: closeUpLabels[index] },
  }));
  registerFonts(doc, fonts, codePointsOf({ ...content, outcomes: textOnly }));
  const measure = jsPdfMeasure(doc);
  const box = contentBox(paper);
  // What gives way, in order (see PageMode): the enlarged blocks of pictures of 1000; then the
  // sentences' size, every outcome's alike, so that the pictures stay; then the pictures' size,
  // every outcome's alike, so that every outcome keeps its pictures; then every outcome's pictures
  // together, so that no outcome's pictures stand alone; then small sentences in two columns of a
  // readable length; last, in one column, which wastes the least room at paragraph ends.
  const hasCloseUps = content.outcomes.some((outcome) => outcome.pictures.closeUp !== null);
  const modes: readonly PageMode[] = [
    ...(hasCloseUps ? [{ pictures: true, closeUps: true }] : []),
    { pictures: true, closeUps: false },
    { pictures: true, closeUps: false, small: true },
    ...(hasCloseUps ? [{ pictures: true, closeUps: true, compact: true, small: true }] : []),
    { pictures: true, closeUps: false, compact: true, small: true },
    { pictures: false, closeUps: false },
    { pictures: false, closeUps: false, small: true, columns: true },
    { pictures: false, closeUps: false, small: true },
  ];
  const fitWith = (mode: PageMode) => ({
    ...firstFit((settings) => layoutPage(content, settings, box, palette, measure, mode)),
    mode,
  });
  let fitted = fitWith(modes[0] ?? { pictures: false, closeUps: false });
  for (const mode of modes.slice(1)) {
    if (fitted.layout.fits) break;
    // A refusal says how far over the most compact page (the last tried) still was.
    fitted = fitWith(mode);
  }
  if (!fitted.layout.fits) {
    const part = fitted.layout.tooLong ?? 'outcomes';
    const over = Math.max(0, fitted.layout.needed - box.height);
    return {
      ok: false,
      reason: 'does-not-fit',
      part,
      overMillimetres: over,
      message: (options.refusal ?? handoutRefusalMessagesEn).doesNotFit(part, over),
    };
  }
  const { layout, settings } = fitted;

  drawPage(doc, layout.items, palette);
  const clinician = (options.clinician ?? '').trim() || topic.clinician.trim();
  doc.setDocumentProperties({
    title: content.title,
    subject: messages.documentSubject,
    author: clinician,
    creator: messages.appVersion(options.appVersion),
    keywords: '',
  });
  doc.setLanguage(messages.language as Parameters<jsPDF['setLanguage']>[0]);
  doc.setCreationDate(creationDate);
  doc.setFileId(fileIdentifier([content.title, options.date, paper, options.appVersion].join('\n')));
  const compactPictures = fitted.mode.pictures && fitted.mode.compact === true;
  const prose = proseOf(content, fitted.mode.pictures, compactPictures);
  const proseText = prose.join('\n\n');
  return {
    ok: true,
    pdf: new Uint8Array(doc.output('arraybuffer')),
    paper,
    pages: doc.getNumberOfPages(),
    readability: readability(proseText),
    readingScale: readabilityFor(proseText, language),
    settings,
    pictures: fitted.mode.pictures,
    compactPictures,
    sentenceSize: fitted.mode.small === true ? settings.list : settings.body,
    wordingSentences: compactPictures ? content.shortWordingSentences : content.wordingSentences,
    prose,
    readingWarnings: typedTextWarnings(topic, language),
  };
}

/**
 * The most generous settings whose layout fits, by halving the ladder (each step
 * only shrinks, so a later step never needs more room); the tightest layout when
 * none fits.
 */
function firstFit(layoutWith: (settings: FitSettings) => PageLayout): { layout: PageLayout; settings: FitSettings } {
  const at = (index: number) => {
    const settings = FIT_LADDER[index] as FitSettings;
    return { layout: layoutWith(settings), settings };
  };
  let best = at(FIT_LADDER.length - 1);
  if (!best.layout.fits) return best;
  let low = 0;
  let high = FIT_LADDER.length - 1;
  while (low < high) {
    const middle = Math.floor((low + high) / 2);
    const tried = at(middle);
    if (tried.layout.fits) {
      best = tried;
      high = middle;
    } else {
      low = middle + 1;
    }
  }
  return best;
}

/** A real calendar date, YYYY-MM-DD, in the years a PDF date from jsPDF may carry. */
function checkedDate(date: string): string {
  const found = /^(\d{4})-(\d{2})-(\d{2})$/.exec(date);
  const [year, month, day] = found === null ? [0, 0, 0] : [Number(found[1]), Number(found[2]), Number(found[3])];
  const calendar = new Date(Date.UTC(year, month - 1, day));
  const real = calendar.getUTCFullYear() === year && calendar.getUTCMonth() === month - 1 && calendar.getUTCDate() === day;
  if (found === null || !real || year < 1970 || year > 2037) {
    throw new RangeError(`buildHandout requires a YYYY-MM-DD date from 1970 to 2037 (got ${date})`);
  }
  return date;
}
