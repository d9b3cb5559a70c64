/**
 * The cautions of DESIGN.md §4.6, carried by every design, screen, quote and printout. Short
 * sentences in this order: review and seal, loads, bracing, no field alterations, local codes.
 */
export const DESIGN_CAUTIONS: readonly string[] = [
  "Results are preliminary until the design is reviewed by the plant's design reviewer and, where the jurisdiction requires, sealed by a registered design professional.",
  'Loads must be confirmed by the building designer.',
  "Trusses need temporary and permanent bracing per the drawings and the industry's bracing guide.",
  'No truss may be cut or altered in the field without a written repair.',
  'Local codes govern.',
];
