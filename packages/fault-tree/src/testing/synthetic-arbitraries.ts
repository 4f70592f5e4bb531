// fast-check arbitraries for the property tests: shapes of valid synthetic trees, and streams of
// numbers to drive random walks. Not public API.
import fc from 'fast-check';
import type { SyntheticShape } from './synthetic-tree.js';
import type { RandomSource } from './random-walker.js';

export function shapeArbitrary(maxNodes = 40): fc.Arbitrary<SyntheticShape> {
  return fc.integer({ min: 2, max: maxNodes }).chain((count) =>
    fc.record({
      parents: fc.tuple(
        ...Array.from({ length: count - 1 }, (_, j) => fc.integer({ min: 0, max: j })),
      ),
      extraEdges: fc.array(
        fc
          .tuple(fc.integer({ min: 0, max: count - 1 }), fc.integer({ min: 0, max: count - 1 }))
          .map(([a, b]) => [Math.min(a, b), Math.max(a, b)] as const),
        { maxLength: count },
      ),
      kindSeeds: fc.array(fc.nat(2), { minLength: count, maxLength: count }),
      fallbacks: fc.array(fc.boolean(), { minLength: count, maxLength: count }),
      viaComputed: fc.array(fc.boolean(), { minLength: count, maxLength: count }),
    }),
  );
}

/** A source of numbers in [0, 1) drawn by fast-check, so failures shrink and replay. */
export function randomSourceArbitrary(): fc.Arbitrary<RandomSource> {
  return fc
    .infiniteStream(fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }))
    .map((stream) => {
      const iterator = stream[Symbol.iterator]();
      return () => {
        const next = iterator.next();
        return next.done ? 0 : next.value;
      };
    });
}
