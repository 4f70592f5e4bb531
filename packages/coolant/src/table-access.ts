// Indexed reads from Heatpath's fixed tables. Under noUncheckedIndexedAccess every read may be
// undefined; a table that is shorter than its code expects is a programming error, so say so loudly.
export function at<T>(items: readonly T[], index: number): T {
  const item = items[index];
  if (item === undefined) {
    throw new RangeError(`Table index ${index} is outside 0…${items.length - 1}.`);
  }
  return item;
}
