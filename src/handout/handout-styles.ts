/**
 * The handout's text styles and page colours, from the fit settings and the
 * chart palette (so text contrast follows the palette's checked tokens).
 */
import type { ChartPalette } from '../render/palette.ts';
import { type FitSettings, MIN_LIST_SIZE } from './fit-settings.ts';
import type { TextStyle } from './text-layout.ts';

/** Colours of the page furniture (rules, shaded boxes); text colours come from the palette. */
export interface PageColours {
  readonly text: string;
  readonly muted: string;
  /** Thin rules between rows and under headings. */
  readonly rule: string;
  /** The rule under the table heading row and above the footer. */
  readonly strongRule: string;
  /** Shading of alternate table rows and of the caution box. */
  readonly shade: string;
  /** The illustrative badge. */
  readonly badge: string;
}

export interface HandoutStyles {
  readonly title: TextStyle;
  readonly heading: TextStyle;
  readonly body: TextStyle;
  readonly bodyMuted: TextStyle;
  readonly list: TextStyle;
  readonly listBold: TextStyle;
  readonly listMuted: TextStyle;
  readonly table: TextStyle;
  readonly tableBold: TextStyle;
  readonly tableNote: TextStyle;
  readonly footer: TextStyle;
  readonly colours: PageColours;
}

/** Styles for one set of fit settings. Greys were chosen to stay apart in a greyscale print. */
export function handoutStyles(settings: FitSettings, palette: ChartPalette): HandoutStyles {
  const colours: PageColours = {
    text: palette.text,
    muted: palette.mutedText,
    rule: '#C8C8C8',
    strongRule: '#6E6E6E',
    shade: '#F2F2F2',
    badge: '#E0E0E0',
  };
  const style = (size: number, bold: boolean, colour: string, leading: number): TextStyle => ({ size, bold, colour, leading });
  return {
    title: style(settings.title, true, colours.text, 1.2),
    heading: style(settings.heading, true, colours.text, 1.25),
    body: style(settings.body, false, colours.text, settings.bodyLeading),
    bodyMuted: style(settings.body, false, colours.muted, settings.bodyLeading),
    list: style(settings.list, false, colours.text, settings.listLeading),
    listBold: style(settings.list, true, colours.text, settings.listLeading),
    listMuted: style(settings.list, false, colours.muted, settings.listLeading),
    table: style(settings.table, false, colours.text, settings.listLeading - 0.05),
    tableBold: style(settings.table, true, colours.text, settings.listLeading - 0.05),
    tableNote: style(Math.max(MIN_LIST_SIZE, settings.table - 1.5), false, colours.muted, 1.2),
    footer: style(MIN_LIST_SIZE, false, colours.muted, 1.25),
    colours,
  };
}
