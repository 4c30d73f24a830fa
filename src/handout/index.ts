/**
 * The one-page patient handout (PDF). Browser-safe; `loadHandoutFonts` (reads the
 * font files from disk, for Node) is in `./node-fonts.ts`.
 *
 *   const fonts = handoutFonts({ regular: regularBytes, bold: boldBytes }); // once
 *   const built = buildHandout(topicResult, topic, { date: '2026-12-01', appVersion }, fonts);
 *   if (built.ok) save(built.pdf); else show(built.message);
 */
export {
  buildHandout,
  type HandoutBuild,
  type HandoutBuilt,
  type HandoutOptions,
  type HandoutRefused,
} from './build-handout.ts';
export { handoutFonts, type HandoutFonts } from './handout-fonts.ts';
export { FIT_LADDER, MIN_BODY_SIZE, MIN_LIST_SIZE, type FitSettings } from './fit-settings.ts';
export { handoutMessagesEn, type HandoutMessages, type HandoutPart } from './messages/en.ts';
export { HANDOUT_MARGIN, PAPER_SIZES, contentBox, type Paper } from './paper-size.ts';
