import { EngineError } from '../errors';
import { TOLERANCE } from '../units';
import { describeLength } from './limits';

/**
 * Where to splice a chord run of consecutive members (lengths in order, any overhang already
 * added to the end member) so that no piece exceeds `stock`. Returns the cut positions k (the cut
 * sits at the panel point between member k − 1 and member k), ascending. A run that fits is not
 * cut; otherwise the cut goes at the interior panel point nearest the middle that keeps both
 * parts within stock, and when no single cut does, at the point nearest the middle and each part
 * is cut again (ties go to the left). Throws EngineError('geometry') when one member alone is longer than the stock.
 */
export const spliceRun = (
  lengths: readonly number[],
  stock: number,
  names: readonly string[],
): number[] => {
  const limit = stock * (1 + TOLERANCE);
  const cuts: number[] = [];
  const prefix = [0];
  for (const l of lengths) prefix.push(prefix[prefix.length - 1] + l);

  const split = (from: number, to: number): void => {
    const total = prefix[to] - prefix[from];
    if (total <= limit) return;
    if (to - from === 1) {
      throw new EngineError(
        'geometry',
        `Chord member ${names[from]} is ${describeLength(lengths[from])} long, longer than the ` +
          `${describeLength(stock)} stock; choose a profile with more panels or longer stock.`,
        { member: names[from], length: lengths[from], stock },
      );
    }
    const middle = prefix[from] + total / 2;
    let best = -1;
    let bestFits = false;
    let bestDistance = Infinity;
    for (let k = from + 1; k < to; k++) {
      const fits = prefix[k] - prefix[from] <= limit && prefix[to] - prefix[k] <= limit;
      const distance = Math.abs(prefix[k] - middle);
      // A cut that keeps both parts within stock always beats one that does not; of two equally
      // near the middle (a symmetric chord), the left one wins so the result does not hang on
      // rounding.
      const nearer = distance < bestDistance - TOLERANCE * total;
      if ((fits && !bestFits) || (fits === bestFits && nearer)) {
        best = k;
        bestFits = fits;
        bestDistance = distance;
      }
    }
    split(from, best);
    cuts.push(best);
    split(best, to);
  };

  split(0, lengths.length);
  return cuts;
};
