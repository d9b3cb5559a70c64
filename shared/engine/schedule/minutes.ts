/**
 * How long a truss takes, from the price book's labour model (perTruss + perPiece × pieces +
 * perJoint × joints, per ply) plus a per-plate term, times the plant's calibration factor.
 */
export interface LabourModel {
  /** Minutes per truss, whatever its size (handling, tagging). */
  perTruss: number;
  perPiece: number;
  perJoint: number;
  /** Minutes per plate placed (each joint has a plate on both faces). */
  perPlate: number;
  /** Measured ÷ modelled time; 1 until the plant calibrates. */
  factor: number;
}

/** What the labour model needs of a truss design. */
export interface TrussWork {
  pieces: number;
  joints: number;
  plates: number;
  plies: number;
}

/** Crew-minutes to build one truss (all plies) by the plant's labour model. */
export function trussMinutes(work: TrussWork, model: LabourModel): number {
  const perPly =
    model.perPiece * work.pieces + model.perJoint * work.joints + model.perPlate * work.plates;
  return model.factor * (model.perTruss + perPly * work.plies);
}

/**
 * The calibration factor that makes the model match what the floor measured: total measured
 * minutes over total modelled minutes (factor 1) of the same trusses.
 */
export function calibrationFactor(
  samples: readonly { work: TrussWork; measuredMinutes: number }[],
  model: LabourModel,
): number {
  const modelled = samples.reduce((s, x) => s + trussMinutes(x.work, { ...model, factor: 1 }), 0);
  const measured = samples.reduce((s, x) => s + x.measuredMinutes, 0);
  return modelled > 0 ? measured / modelled : 1;
}
