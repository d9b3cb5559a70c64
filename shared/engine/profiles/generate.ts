import { assembleProfile } from './assemble';
import { doubleFinkLayout } from './doubleFink';
import { fanLayout } from './fan';
import { finkLayout } from './fink';
import { flatLayout } from './flat';
import { howeLayout } from './howe';
import { kingPostLayout } from './kingPost';
import type { Layout } from './layout';
import { monoLayout } from './mono';
import { queenPostLayout } from './queenPost';
import { scissorLayout } from './scissor';
import type { ProfileKind, ProfileParams, TrussProfile } from './types';
import { validateProfileParams } from './validate';

const LAYOUTS: Record<ProfileKind, (p: ProfileParams) => Layout> = {
  kingPost: kingPostLayout,
  queenPost: queenPostLayout,
  fink: finkLayout,
  howe: howeLayout,
  fan: fanLayout,
  doubleFink: doubleFinkLayout,
  scissor: scissorLayout,
  mono: monoLayout,
  flat: flatLayout,
};

/**
 * The line model of a truss profile: joints at the intersections of the chord and web design
 * lines (mm), bearings at x = 0 and x = span on y = 0, left heel pinned, right heel on a roller;
 * members with roles and centre-line lengths; chord and web pieces with splices; overhangs as
 * top-chord cantilevers outside the axial model. Statically determinate and stable for every
 * accepted input. Throws EngineError('geometry') for a truss that cannot be built.
 */
export const generateProfile = (params: ProfileParams): TrussProfile => {
  const stock = validateProfileParams(params);
  return assembleProfile(params, LAYOUTS[params.kind](params), stock);
};
