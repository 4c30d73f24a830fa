import { bench, describe } from 'vitest';
import { buildHandout } from '../../src/handout/build-handout.ts';
import { loadHandoutFonts } from '../../src/handout/node-fonts.ts';
import { demos } from './support.ts';

// The fonts are read once, as the app and the command line do; each build embeds its own cut-down copy.
const fonts = loadHandoutFonts();
const [heart, screening] = demos();
if (heart === undefined || screening === undefined) throw new Error('the demo topics are missing');

describe('building a handout', () => {
  bench('the first demo topic on A4 (3 arrays of 100, 3 outcomes)', () => {
    buildHandout(heart.result, heart.topic, { date: '2026-12-01', appVersion: '0.1.0' }, fonts);
  });

  bench('the first demo topic on US Letter', () => {
    buildHandout(heart.result, heart.topic, { date: '2026-12-01', appVersion: '0.1.0', paper: 'letter' }, fonts);
  });

  bench('the screening demo topic on A4 (2 arrays of 1000)', () => {
    buildHandout(screening.result, screening.topic, { date: '2026-12-01', appVersion: '0.1.0' }, fonts);
  });
});

describe('reading the fonts', () => {
  bench('DejaVu Sans regular and bold, once per session', () => {
    loadHandoutFonts();
  });
});
