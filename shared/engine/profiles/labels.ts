/**
 * Joint label for a zero-based index: A … Z, then AA, AB … ZZ, then AAA (bijective base 26, as
 * spreadsheet columns count).
 */
export const jointLabel = (index: number): string => {
  let n = index + 1;
  let label = '';
  while (n > 0) {
    const digit = (n - 1) % 26;
    label = String.fromCharCode(65 + digit) + label;
    n = (n - 1 - digit) / 26;
  }
  return label;
};

/**
 * Member id from its two joint labels in label order ("AB", "CAA"). Unique while every label has
 * at most two letters (fewer than 702 joints): a lower-ordered label is never longer than a
 * higher one, so the split point of the concatenation is fixed by the length.
 */
export const memberId = (lower: string, higher: string): string => lower + higher;
