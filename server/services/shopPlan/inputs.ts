/**
 * What a shop plan is made from, as hashes: the order's approved designs (each line's mark,
 * quantity, plies, design version and stored design) and the plant's stock settings. A stored
 * plan whose hashes differ from the order's now is out of date.
 */
import { createHash } from 'node:crypto';
import type { StockSettings } from '../../../shared/api/stock';
import type { OrderLine } from '../../models';

const sha256 = (value: unknown) => createHash('sha256').update(JSON.stringify(value)).digest('hex');

/** Hash of the lines as the saw would cut them (JSONB reads back with a fixed key order). */
export const designsHash = (lines: readonly OrderLine[]) =>
  sha256(
    lines.map((l) => [
      l.id,
      l.mark,
      l.quantity,
      l.plies,
      l.reviewState,
      l.designVersion,
      l.engineVersion,
      l.designInput,
      l.designResult,
    ]),
  );

/** Hash of the stock the plan was cut from (demo stock included). */
export const stockHash = (stock: { settings: StockSettings; demo: boolean }) =>
  sha256([stock.demo, stock.settings]);
