// @vitest-environment node
/**
 * The handout's file size with many people: each look of person is drawn once and placed
 * per person (form XObjects, ISO 32000-1 §8.10), so even thousands of people keep the file
 * small enough to send by e-mail. The limits are this project's own targets.
 */
import { describe, expect, it } from 'vitest';
import { computeTopic } from '../../src/core/topic/compute-topic.ts';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { demos, testFonts } from './support.ts';
import { shapedTopic } from './topic-builder.ts';

const OPTIONS = { date: '2026-12-01', appVersion: '0.1.0' } as const;

describe('handout file size', () => {
  it('keeps the screening demo (two arrays of 1000 and their enlarged blocks) under 60 KB', () => {
    const screening = demos().find((demo) => demo.name === '02-bowel-screening.json');
    if (screening === undefined) throw new Error('the screening demo is missing');
    expect(screening.result.denominator).toBe(1000);
    const built = buildHandout(screening.result, screening.topic, OPTIONS, testFonts());
    if (!built.ok) throw new Error(built.message);
    expect(built.pdf.byteLength).toBeLessThan(60_000);
  });

  it('keeps a topic of four options (the most a topic may have), each drawn per 1000, under 100 KB', () => {
    const topic = shapedTopic({ options: 4, outcomes: 1 });
    const result = computeTopic(topic, { per: 1000 });
    expect(result.denominator).toBe(1000);
    const built = buildHandout(result, topic, OPTIONS, testFonts());
    if (!built.ok) throw new Error(built.message);
    expect(built.pages).toBe(1);
    expect(built.pdf.byteLength).toBeLessThan(100_000);
  });
});
