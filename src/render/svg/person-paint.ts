/**
 * The paint of one person figure (fill, outline, dash) for a group, as SVG
 * attribute values. Plain data, shared by the first draw and by live updates.
 */
import type { PersonLook } from '../../core/direction.ts';
import type { ChartPalette, PatternName } from '../palette.ts';
import { svgNumber } from './svg-number.ts';

/** Ids of the chart's pattern fills. */
export type PatternIds = Readonly<Record<Exclude<PatternName, 'solid'>, string>>;

export interface PersonPaint {
  readonly fill: string;
  readonly stroke: string;
  /** Dash of the outline of uncertain people; null for a solid outline. */
  readonly dash: string | null;
}

/**
 * The paint of a person in `look` (from `lookOf`). `uncertain` is a hollow figure with a
 * dashed outline, for views that draw only the people of the interval; the charts keep
 * every person in their look and ring the uncertain ones instead (`range-ring.ts`).
 */
export function personPaint(
  palette: ChartPalette,
  look: PersonLook | 'uncertain',
  patternIds: PatternIds,
  cellSize: number,
): PersonPaint {
  if (look === 'uncertain') {
    const [dash, gap] = palette.uncertainDash;
    return {
      fill: palette.background,
      stroke: palette.uncertainOutline,
      dash: `${svgNumber(dash * cellSize)} ${svgNumber(gap * cellSize)}`,
    };
  }
  const style = palette.groups[look];
  return {
    fill: style.pattern === 'solid' ? style.fill : `url(#${patternIds[style.pattern]})`,
    stroke: style.outline,
    dash: null,
  };
}

/** Ids of the pattern fills of a chart, from its id prefix. */
export function patternIdsFor(prefix: string): PatternIds {
  return { dots: `${prefix}-dots`, hatch: `${prefix}-hatch` };
}
