import type { EffectMeasure } from '../../effect-measures.ts';

/** The plain English name of every measure: a missing one fails the type-check. */
export const measureNamesEn: Readonly<Record<EffectMeasure, string>> = {
  rr: 'risk ratio',
  or: 'odds ratio',
  hr: 'hazard ratio',
  rrr: 'relative risk reduction',
  arr: 'absolute risk reduction',
};
