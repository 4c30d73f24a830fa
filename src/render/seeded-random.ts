/**
 * A small seeded pseudo-random generator, so a scattered teaching layout is the
 * same on every screen and on paper.
 */

/**
 * The mulberry32 generator (Tommy Ettinger, public domain, 2017): a 32-bit state
 * stepped by a Weyl sequence and mixed, giving floats in [0, 1).
 *
 * @example const next = mulberry32(1); next(); // => 0.6270739405881613
 */
export function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let mixed = state;
    mixed = Math.imul(mixed ^ (mixed >>> 15), mixed | 1);
    mixed ^= mixed + Math.imul(mixed ^ (mixed >>> 7), mixed | 61);
    return ((mixed ^ (mixed >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * The numbers 0 … length − 1 in an order shuffled by Fisher–Yates (Durstenfeld's
 * in-place form) driven by mulberry32 with the given seed.
 */
export function seededPermutation(length: number, seed: number): number[] {
  const order = Array.from({ length }, (_, position) => position);
  const next = mulberry32(seed);
  for (let last = length - 1; last > 0; last -= 1) {
    const pick = Math.floor(next() * (last + 1));
    const held = order[last] as number;
    order[last] = order[pick] as number;
    order[pick] = held;
  }
  return order;
}
