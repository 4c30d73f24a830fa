/**
 * The Node-only part of the people charts: `renderChartSvg`, which draws in a
 * jsdom document (command line, tests). Everything else is imported from its own module.
 *
 *   import { outcomeChart } from '../render/chart-model.ts';
 *   import { renderChartSvg } from '../render/node.ts';
 *   const svg = renderChartSvg(outcomeChart(topicResult, 'stroke'), { width: 720 });
 */
export { renderChartSvg, type RenderChartSvgOptions } from './svg/render-chart-svg.ts';
