/**
 * Colour and pattern tokens of the people charts, shared by the SVG renderer,
 * the PDF renderer, the app and the handout. Based on the Okabe–Ito palette
 * (Okabe & Ito 2008, Color Universal Design); the incremental groups also carry a
 * pattern so that a greyscale print never relies on colour alone (WCAG 2.2, 1.4.1).
 */
import type { PersonLook } from '../core/direction.ts';

/** The fill pattern of a group: solid, white dots (benefit) or white diagonal hatching (harm). */
export type PatternName = 'solid' | 'dots' | 'hatch';

/** How one look of person is drawn (see `lookOf` in `core/direction.ts`). */
export interface GroupStyle {
  /** Fill of the figure. */
  readonly fill: string;
  /** Outline of the figure; carries the ≥ 3:1 contrast when the fill is light. */
  readonly outline: string;
  readonly pattern: PatternName;
  /** Colour of the dots or hatch lines drawn over the fill. */
  readonly patternInk: string;
}

/** Every token a chart needs. */
export interface ChartPalette {
  readonly name: string;
  readonly background: string;
  /** Titles and labels (≥ 4.5:1 on the background). */
  readonly text: string;
  /** Secondary text such as the range sentence (≥ 4.5:1 on the background). */
  readonly mutedText: string;
  /**
   * The four looks: `helped` is the look of people the option helps (fewer unwanted or more
   * wanted events), `harmed` of those it harms. A group becomes a look through `lookOf`.
   */
  readonly groups: Readonly<Record<PersonLook, GroupStyle>>;
  /** Dashed ring drawn around people whose group depends on where in the interval the truth lies. */
  readonly uncertainOutline: string;
  /** Dash of that ring, in cell sizes (dash, gap). */
  readonly uncertainDash: readonly [number, number];
  /** Width of every figure's outline, as a share of the cell size. */
  readonly outlineWidth: number;
}

/** The eight Okabe–Ito colours (Okabe & Ito 2008). */
export const OKABE_ITO = {
  black: '#000000',
  orange: '#E69F00',
  skyBlue: '#56B4E9',
  bluishGreen: '#009E73',
  yellow: '#F0E442',
  blue: '#0072B2',
  vermillion: '#D55E00',
  reddishPurple: '#CC79A7',
} as const;

/**
 * The default palette for screen and colour print: events blue, benefit bluish
 * green with dots, harm vermillion with hatching, people without the outcome light
 * grey with a dark outline.
 */
export const colourPalette: ChartPalette = {
  name: 'colour',
  background: '#FFFFFF',
  text: '#1A1A1A',
  mutedText: '#4D4D4D',
  groups: {
    event: { fill: OKABE_ITO.blue, outline: '#005A8C', pattern: 'solid', patternInk: OKABE_ITO.blue },
    helped: { fill: OKABE_ITO.bluishGreen, outline: '#00664A', pattern: 'dots', patternInk: '#FFFFFF' },
    harmed: { fill: OKABE_ITO.vermillion, outline: '#9C4500', pattern: 'hatch', patternInk: '#FFFFFF' },
    free: { fill: '#E8E8E8', outline: '#767676', pattern: 'solid', patternInk: '#E8E8E8' },
  },
  uncertainOutline: '#1A1A1A',
  uncertainDash: [0.09, 0.06],
  outlineWidth: 0.04,
};

/**
 * The black-and-white print theme: black events, mid-grey patterned increments,
 * white people with a dark outline.
 */
export const blackAndWhitePalette: ChartPalette = {
  name: 'black-and-white',
  background: '#FFFFFF',
  text: '#000000',
  mutedText: '#333333',
  groups: {
    event: { fill: '#000000', outline: '#000000', pattern: 'solid', patternInk: '#000000' },
    helped: { fill: '#6E6E6E', outline: '#000000', pattern: 'dots', patternInk: '#FFFFFF' },
    harmed: { fill: '#6E6E6E', outline: '#000000', pattern: 'hatch', patternInk: '#FFFFFF' },
    free: { fill: '#FFFFFF', outline: '#595959', pattern: 'solid', patternInk: '#FFFFFF' },
  },
  uncertainOutline: '#000000',
  uncertainDash: [0.09, 0.06],
  outlineWidth: 0.045,
};

/** The palettes by name, for renderers that record which one drew a chart. */
export const PALETTES: Readonly<Record<string, ChartPalette>> = {
  [colourPalette.name]: colourPalette,
  [blackAndWhitePalette.name]: blackAndWhitePalette,
};
