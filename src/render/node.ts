/**
 * The Node-only part of the people charts: `renderChartSvg`, which draws in a
 * jsdom document (command line, tests). Everything else is in `./index.ts`.
 *
 *   import { outcomeChart } from '../render/index.ts';
 *   import { renderChartSvg } from '../render/node.ts';
 *   const svg = renderChartSvg(outcomeChart(topicResult, 'stroke'), { width: 720 });
 */
export { renderChartSvg, type RenderChartSvgOptions } from './svg/render-chart-svg.ts';
