import { select as d3Select } from 'd3-selection';
import { describe, expect, test } from 'vitest';
import { select } from '../../../src/render/svg/svg-selection.ts';
import { svgTextDocument } from '../../../src/render/svg/svg-text-document.ts';
import { testDocument } from './parse-svg.ts';

const SVG = 'http://www.w3.org/2000/svg';

function freshSvg(): SVGSVGElement {
  return testDocument.createElementNS(SVG, 'svg');
}

describe('select: the chained SVG building the charts use', () => {
  test('a child is made in its parent’s namespace, appended last, and selected', () => {
    const svg = freshSvg();
    svg.append(testDocument.createElementNS(SVG, 'title'));
    const group = select(svg).append('g');
    expect(group.node().namespaceURI).toBe(SVG);
    expect(group.node().localName).toBe('g');
    expect(svg.lastElementChild).toBe(group.node());
  });

  test('attributes are written as text, and null or undefined removes one', () => {
    const rect = select(freshSvg()).append('rect').attr('width', 12.5).attr('fill', '#fff').attr('aria-hidden', true);
    expect(rect.node().getAttribute('width')).toBe('12.5');
    expect(rect.node().getAttribute('aria-hidden')).toBe('true');
    rect.attr('fill', null).attr('width', undefined);
    expect(rect.node().hasAttribute('fill')).toBe(false);
    expect(rect.node().hasAttribute('width')).toBe(false);
  });

  test('text replaces the content', () => {
    const text = select(freshSvg()).append('text');
    text.append('tspan').text('first');
    text.text('only this');
    expect(text.node().childNodes).toHaveLength(1);
    expect(text.node().textContent).toBe('only this');
  });

  test('childrenMatching finds direct children only, in order', () => {
    const svg = select(freshSvg());
    const first = svg.append('g').attr('class', 'chart-array');
    svg.append('g').attr('class', 'chart-heading').append('g').attr('class', 'chart-array');
    const second = svg.append('g').attr('class', 'chart-array');
    expect(svg.childrenMatching('g.chart-array')).toEqual([first.node(), second.node()]);
  });

  test('the same steps make the same markup as d3-selection, in a browser DOM and in the text document', () => {
    /** The steps, through the calls both libraries take alike (their own types differ). */
    type Chain = { append(name: string): Chain; attr(name: string, value: string | number): Chain; text(value: string): Chain };
    const build = (root: Chain) => {
      root.append('title').text('Ten people');
      const pattern = root.append('defs').append('pattern').attr('id', 'dots').attr('width', 4).attr('height', 4);
      pattern.append('circle').attr('cx', 2).attr('cy', 2).attr('r', 0.75);
      root.append('g').attr('class', 'array-text').attr('aria-hidden', 'true').append('text').text('With treatment');
    };
    const ours = freshSvg();
    const theirs = freshSvg();
    build(select(ours) as unknown as Chain);
    build(d3Select(theirs) as unknown as Chain);
    expect(ours.outerHTML).toBe(theirs.outerHTML);
    expect(ours.outerHTML).toContain('<pattern id="dots" width="4" height="4"><circle cx="2" cy="2" r="0.75">');

    const textDocument = svgTextDocument();
    const oursText = textDocument.createElementNS(SVG, 'svg') as unknown as SVGSVGElement;
    const theirsText = textDocument.createElementNS(SVG, 'svg') as unknown as SVGSVGElement;
    build(select(oursText) as unknown as Chain);
    build(d3Select(theirsText) as unknown as Chain);
    expect(String(oursText.outerHTML)).toBe(String(theirsText.outerHTML));
  });
});
