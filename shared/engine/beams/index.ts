/** Beams on rigid supports: support and span moments of a continuous beam. */
export { spanPeakMoment, supportMoments, type ContinuousBeam } from './continuousBeam';
