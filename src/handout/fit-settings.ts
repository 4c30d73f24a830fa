/**
 * The type sizes and spacing of a handout, and the order in which they give way
 * when content is long: first the table and lists (down to 9 pt) and the space
 * between sections, then the charts, and only last the body text (never below
 * 11 pt; 12 pt by default). Past the ladder, the page's modes give way
 * (`PageMode` in page-layout.ts): every outcome's sentences may then be set at
 * the list size, never below 9 pt.
 */

/** One set of sizes: points for type, millimetres for lengths. */
export interface FitSettings {
  /** Body text: who the numbers are for and the plain sentences. */
  readonly body: number;
  readonly title: number;
  readonly heading: number;
  /** Lists: side effects, evidence, questions, caution. */
  readonly list: number;
  readonly table: number;
  readonly chartText: number;
  /** Distance between people in an array of 100, and of 1000, in millimetres. */
  readonly cell100: number;
  readonly cell1000: number;
  /** Distance between people in the enlarged block of 100 beside a picture of 1000, in millimetres. */
  readonly closeUpCell: number;
  /** Space between sections, in millimetres. */
  readonly space: number;
  /** Ruled lines left for the patient to write what matters to them. */
  readonly writingLines: number;
  /** Distance between baselines of body text, and of table and list text, as multiples of the size. */
  readonly bodyLeading: number;
  readonly listLeading: number;
  /** Space above and below the text of a table row, in millimetres. */
  readonly rowPadding: number;
}

/** The smallest body text a handout may use, in points. */
export const MIN_BODY_SIZE = 11;
/** The smallest table and list text, in points. */
export const MIN_LIST_SIZE = 9;

/** The most generous settings: what a short topic is printed with. */
export const ROOMY: FitSettings = {
  body: 12,
  title: 17,
  heading: 12.5,
  list: 10.5,
  table: 10.5,
  chartText: 10,
  cell100: 5.2,
  cell1000: 1.6,
  closeUpCell: 2.6,
  space: 6,
  writingLines: 2,
  bodyLeading: 1.35,
  listLeading: 1.3,
  rowPadding: 1.3,
};

/** Each step changes a few settings of the one before it. */
const STEPS: readonly Partial<FitSettings>[] = [
  { writingLines: 1, space: 5 },
  { list: 10, table: 10, cell100: 4.8 },
  { title: 16, space: 4.5, chartText: 9.5 },
  { list: 9.5, table: 9.5, cell100: 4.4, rowPadding: 1.1 },
  { writingLines: 0, space: 4 },
  { list: 9, table: 9, chartText: 9, cell100: 4, title: 15, rowPadding: 1 },
  { cell100: 3.6, cell1000: 1.4, closeUpCell: 2.4, space: 3.5, listLeading: 1.25, rowPadding: 0.9 },
  { cell100: 3.3, bodyLeading: 1.3, title: 14 },
  { body: 11.5, heading: 12 },
  { body: 11, heading: 11.5, space: 3 },
  {
    cell100: 3,
    cell1000: 1.2,
    closeUpCell: 2.2,
    space: 2.5,
    title: 13,
    heading: 11,
    bodyLeading: 1.25,
    listLeading: 1.2,
    rowPadding: 0.7,
  },
  { cell100: 2.8, space: 2, rowPadding: 0.5 },
  { cell100: 2.5, cell1000: 1.1, closeUpCell: 2, space: 1.5, bodyLeading: 1.2, rowPadding: 0.3 },
];

/**
 * The settings to try, most generous first; every one keeps body text at or above
 * {@link MIN_BODY_SIZE} and table and list text at or above {@link MIN_LIST_SIZE}.
 */
export const FIT_LADDER: readonly FitSettings[] = STEPS.reduce<FitSettings[]>(
  (ladder, step) => [...ladder, { ...(ladder[ladder.length - 1] ?? ROOMY), ...step }],
  [ROOMY],
);
