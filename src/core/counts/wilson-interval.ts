import { DEFAULT_LEVEL } from '../check-effect.ts';
import { checkArm } from './check-arm.ts';
import type { IntervalEstimate } from './counts-types.ts';
import { intervalEstimate } from './interval-estimate.ts';
import { zForLevel } from './z-for-level.ts';

/**
 * A proportion with its Wilson score interval (Wilson 1927; Newcombe 1998, method 3):
 * (x + z²/2 ± z·√(x(n − x)/n + z²/4)) / (n + z²). The lower bound is exactly 0 at
 * 0 events and the upper bound exactly 1 when every person has the event.
 */
export function wilsonInterval(events: number, total: number, level = DEFAULT_LEVEL): IntervalEstimate {
  checkArm({ events, total }, 'arm');
  const z = zForLevel(level);
  const zSquared = z * z;
  const denominator = total + zSquared;
  const centre = (events + zSquared / 2) / denominator;
  const halfWidth = (z / denominator) * Math.sqrt((events * (total - events)) / total + zSquared / 4);
  const lower = events === 0 ? 0 : Math.max(0, centre - halfWidth);
  const upper = events === total ? 1 : Math.min(1, centre + halfWidth);
  return intervalEstimate(events / total, lower, upper);
}
