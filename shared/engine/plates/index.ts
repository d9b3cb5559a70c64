/** Connector plates: catalogs (demo and plant) and the per-joint plate choice. */
export { DEMO_PLATE_CATALOG, DEMO_PLATE_LABEL, validatePlateCatalog } from './catalog';
export { designJointPlate } from './design';
export { plateGovernsText } from './report';
export { foldAngle, heelReduction, lateralValue } from './lateral';
export { steelChecks, steelSections, type SteelSection } from './steel';
export type {
  Direction,
  JointPlateDesign,
  MemberPlateCheck,
  PlateCatalog,
  PlateDesignOptions,
  PlateJoint,
  PlateJointKind,
  PlateJointMember,
  PlateSpec,
  SteelCheck,
  SteelLine,
} from './types';
