/**
 * Options of the SVG chart renderer, and how a drawn chart records them so a live
 * update can draw the same way.
 */
import type { ChartModel } from '../chart-model.ts';
import { type ChartPalette, PALETTES, colourPalette } from '../palette.ts';

export interface SvgChartOptions {
  /** Width of the chart in CSS pixels (default 720); the height follows from the content. */
  readonly width?: number;
  /** Body text size in CSS pixels (default 14). */
  readonly fontSize?: number;
  readonly palette?: ChartPalette;
  /** Outline the people whose group depends on where in the interval the truth lies (default off). */
  readonly showRange?: boolean;
  /** Prefix of the ids inside the SVG (default from the model's id), unique per page. */
  readonly idPrefix?: string;
  /** CSS font-family of the text. */
  readonly fontFamily?: string;
}

/** Options with every default filled in. */
export interface ResolvedSvgChartOptions {
  readonly width: number;
  readonly fontSize: number;
  readonly palette: ChartPalette;
  readonly showRange: boolean;
  readonly idPrefix: string;
  readonly fontFamily: string;
}

export const DEFAULT_FONT_FAMILY = "'DejaVu Sans', Verdana, Arial, sans-serif";

/** Fill in defaults. */
export function resolveSvgOptions(model: ChartModel, options: SvgChartOptions = {}): ResolvedSvgChartOptions {
  return {
    width: options.width ?? 720,
    fontSize: options.fontSize ?? 14,
    palette: options.palette ?? colourPalette,
    showRange: options.showRange ?? false,
    idPrefix: options.idPrefix ?? `chart-${model.id.replace(/[^A-Za-z0-9_-]/g, '-')}`,
    fontFamily: options.fontFamily ?? DEFAULT_FONT_FAMILY,
  };
}

/** The options a drawn chart recorded on its root, for a live update. */
export function recordedSvgOptions(svg: SVGSVGElement, model: ChartModel): ResolvedSvgChartOptions {
  const number = (name: string) => {
    const value = Number(svg.getAttribute(name));
    return Number.isFinite(value) && value > 0 ? value : undefined;
  };
  const paletteName = svg.getAttribute('data-palette') ?? '';
  const width = number('data-width');
  const fontSize = number('data-font-size');
  const palette = PALETTES[paletteName];
  const idPrefix = svg.getAttribute('data-id-prefix');
  const fontFamily = svg.getAttribute('font-family');
  return resolveSvgOptions(model, {
    ...(width === undefined ? {} : { width }),
    ...(fontSize === undefined ? {} : { fontSize }),
    ...(palette === undefined ? {} : { palette }),
    showRange: svg.getAttribute('data-show-range') === 'true',
    ...(idPrefix === null ? {} : { idPrefix }),
    ...(fontFamily === null ? {} : { fontFamily }),
  });
}
