// A small seeded generator (mulberry32) and Gaussian noise from it, so synthetic logs are the
// same on every run and a failing test can be replayed from its seed.

export type Random = () => number;

export function seededRandom(seed: number): Random {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 2 ** 32;
  };
}

/** Normally distributed noise with standard deviation `sigma` (Box–Muller). */
export function gaussian(random: Random, sigma: number): number {
  const u = Math.max(random(), Number.MIN_VALUE);
  const v = random();
  return sigma * Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}
