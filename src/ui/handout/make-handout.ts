/**
 * The handout in the browser: fetch the two DejaVu Sans faces from the app's own files
 * (once), then build the one-page PDF from the same computed topic as the screen, in the
 * topic's language.
 * Loaded lazily by `handout-builder.ts`.
 */
import boldFontUrl from 'dejavu-fonts-ttf/ttf/DejaVuSans-Bold.ttf?url';
import regularFontUrl from 'dejavu-fonts-ttf/ttf/DejaVuSans.ttf?url';
import { version } from '../../../package.json';
import { noticeSentences } from '../../core/messages/describe.ts';
import { topicLanguage } from '../../core/topic/topic-language.ts';
import { buildHandout } from '../../handout/build-handout.ts';
import { handoutWordsFor } from '../../handout/handout-words.ts';
import { handoutFonts } from '../../handout/handout-fonts.ts';
import type { HandoutFonts } from '../../handout/handout-fonts.ts';
import type { HandoutOutcome, HandoutRequest } from './handout-builder.ts';

let fonts: Promise<HandoutFonts> | null = null;

async function fontBytes(url: string): Promise<Uint8Array> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(`a font file could not be read (${response.status})`);
  return new Uint8Array(await response.arrayBuffer());
}

function loadFonts(): Promise<HandoutFonts> {
  fonts ??= Promise.all([fontBytes(regularFontUrl), fontBytes(boldFontUrl)]).then(([regular, bold]) =>
    handoutFonts({ regular, bold }),
  );
  // A failed read may succeed later (a file briefly unavailable); do not keep the failure.
  fonts.catch(() => {
    fonts = null;
  });
  return fonts;
}

/** Build the handout PDF for a request. */
export async function makeHandout(request: HandoutRequest): Promise<HandoutOutcome> {
  const built = buildHandout(
    request.result,
    request.topic,
    {
      paper: request.paper,
      date: request.date,
      appVersion: version,
      showNnt: request.showNnt,
      // The sheet in the topic's own language (the handout chunk carries every language's words).
      words: handoutWordsFor(topicLanguage(request.topic)),
      refusal: request.refusal,
    },
    await loadFonts(),
  );
  if (!built.ok) return { ok: false, message: built.message };
  return { ok: true, pdf: built.pdf, warnings: noticeSentences(built.readingWarnings) };
}
