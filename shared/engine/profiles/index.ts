/** Truss profile generators: parameters → labelled line model, pieces and overhangs. */
export { generateProfile } from './generate';
export { PROFILE_KINDS, PROFILE_KIND_LABELS, type ProfileKindInfo } from './kinds';
export { jointLabel } from './labels';
export {
  DEFAULT_STOCK_LENGTH,
  FLAT_DEPTH_RANGE,
  FLAT_PANEL_RANGE,
  HEEL_RANGE,
  MIN_JOINT_ANGLE_DEG,
  MIN_MEMBER_LENGTH,
  OVERHANG_RANGE,
  PITCH_RANGE,
  SCISSOR_MIN_PITCH_DIFFERENCE,
  SPAN_RANGE,
  type Range,
} from './limits';
export { validateProfileParams } from './validate';
export type * from './types';
