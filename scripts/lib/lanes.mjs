// Runs chains of steps side by side: each lane is a list of async steps run one after another,
// and the lanes run at the same time. With one lane allowed, every step runs in turn, in lane
// order. A step that throws stops its own lane only; the first error is rethrown at the end.
export async function runLanes(lanes, allowed) {
  const chains = allowed > 1 ? lanes : [lanes.flat()];
  const errors = [];
  await Promise.all(
    chains.map(async (chain) => {
      try {
        for (const stepOf of chain) await stepOf();
      } catch (error) {
        errors.push(error);
      }
    }),
  );
  if (errors.length) throw errors[0];
}

/** How many lanes a machine takes: one per core, at most `most`, set with HEATPATH_TEST_LANES. */
export function laneCount(cores, most, env = process.env) {
  const wanted = Number(env.HEATPATH_TEST_LANES);
  if (Number.isInteger(wanted) && wanted >= 1) return wanted;
  return Math.max(1, Math.min(most, cores));
}
