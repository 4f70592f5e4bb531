// The quantities a tree's measurements and computed values may ask for. The vocabulary itself
// (quantities, unit codes, canonical and entry units, symbols) is Heatpath's one table in
// @heatpath/coolant; the tree format takes all of it except volume flow, which only the
// calculators ask for. Whether a unit fits a quantity is the table's entry units (acceptsUnit).
import { quantities as allQuantities } from '@heatpath/coolant';
import type { Quantity } from '@heatpath/coolant';

export {
  acceptsUnit,
  canonicalUnitOf,
  quantityInfo,
  unitCodes,
  unitSymbol,
} from '@heatpath/coolant';
export type { Quantity, QuantityInfo, UnitCode } from '@heatpath/coolant';

/** A quantity a tree may ask for: any of Heatpath's but volume flow. */
export type TreeQuantity = Exclude<Quantity, 'volumeFlow'>;

/** Quantities a tree may ask for (the tree format's `quantity` values), in the table's order. */
export const quantities: readonly TreeQuantity[] = allQuantities.filter(
  (quantity): quantity is TreeQuantity => quantity !== 'volumeFlow',
);
