/**
 * Pieces as they are cut: every piece of a truss as a board of real lumber (outline in truss
 * coordinates, long-point length, end cuts and angles, saw notes) and an order's cut list.
 */
export { cutPieces } from './cutPieces';
export { describeEnd } from './marks';
export { toSixteenths, SQUARE_CUT_TOLERANCE_DEG } from './ends';
export { lumberDepth } from './boards';
export type * from './types';
export {
  buildCutList,
  type CutList,
  type CutListGroup,
  type CutListRow,
  type CutListTruss,
} from './cutList';
