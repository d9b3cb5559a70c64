import { inchToMm, inch, mm, type Mm } from '../units';

/** What a parser returns when the text is not a value; `error` is shown to the user as is. */
export interface ParseError {
  error: string;
}

/** True when a `parseLength`/`parsePitch` result is an error rather than a value. */
export const isParseError = (r: number | ParseError): r is ParseError =>
  typeof r === 'object' && r !== null && 'error' in r;

/** Which unit system a bare number is read in: imperial → inches, metric → millimetres. */
export type LengthUnits = 'imperial' | 'metric';

const DECIMAL = /^(?:\d+(?:\.\d*)?|\.\d+)$/;
const MIXED = /^(\d+)[\s-]+(\d+)\/(\d+)$/;
const FRACTION = /^(\d+)\/(\d+)$/;
const FEET_DASH_INCHES = /^(\d+)-(\d+(?:\.\d+)?(?: \d+\/\d+)?)$/;

/** Typographic primes and words become the two marks the grammar knows: ' and ". */
const normalizeImperial = (text: string): string =>
  text
    .trim()
    .toLowerCase()
    .replace(/[’′‘`]/g, "'")
    .replace(/[”″“]|''/g, '"')
    .replace(/\s*(?:feet|foot|ft)\.?(?![a-z])/g, "'")
    .replace(/\s*(?:inches|inch|in)\.?(?![a-z])/g, '"')
    .replace(/\s+/g, ' ');

/** Inches text without marks: "6", "6.5", "6 1/2", "6-1/2", "1/2". */
const readInches = (text: string): number | ParseError => {
  if (DECIMAL.test(text)) return Number(text);
  const mixed = MIXED.exec(text);
  const frac = mixed ? null : FRACTION.exec(text);
  if (!mixed && !frac) return { error: '' };
  const [whole, num, den] = mixed
    ? [Number(mixed[1]), Number(mixed[2]), Number(mixed[3])]
    : [0, Number(frac![1]), Number(frac![2])];
  if (den === 0) return { error: 'A fraction cannot have 0 below the line' };
  if (mixed && num >= den) return { error: `Write the fraction ${num}/${den} as less than 1 inch` };
  return whole + num / den;
};

const imperialHint = (text: string) =>
  `Can't read "${text.trim()}" as a length; try 28'-6 1/2", 28.5' or 342 1/2"`;

/** Imperial text → inches. Bare numbers are inches (a sales desk types 342 1/2 for 28'-6 1/2"). */
const parseImperial = (raw: string): number | ParseError => {
  let s = normalizeImperial(raw);
  // "28-6" and "28-6 1/2" are feet-dash-inches as the trade writes them without marks ("6-1/2",
  // a whole number dashed to a fraction, stays inches).
  const dashed = FEET_DASH_INCHES.exec(s);
  if (dashed) s = `${dashed[1]}'${dashed[2]}"`;
  const negative = s.startsWith('-');
  if (negative) s = s.slice(1).trim();
  let feet = 0;
  let rest = s;
  const tick = s.indexOf("'");
  if (tick >= 0) {
    const feetText = s.slice(0, tick).trim();
    if (!DECIMAL.test(feetText)) return { error: imperialHint(raw) };
    feet = Number(feetText);
    rest = s
      .slice(tick + 1)
      .replace(/^[\s-]+/, '')
      .trim();
  }
  if (rest.endsWith('"')) rest = rest.slice(0, -1).trim();
  else if (tick >= 0 && rest !== '' && !/\d$/.test(rest)) return { error: imperialHint(raw) };
  if (/['"]/.test(rest)) return { error: imperialHint(raw) };
  if (rest === '' && tick < 0) return { error: imperialHint(raw) };
  const inches = rest === '' ? 0 : readInches(rest);
  if (isParseError(inches)) return { error: inches.error || imperialHint(raw) };
  if (tick >= 0 && inches >= 12) {
    return { error: `Inches after the feet must be under 12 (got ${inches}); or enter all inches` };
  }
  const total = feet * 12 + inches;
  return negative ? -total : total;
};

const METRIC = /^(-)?\s*(\d+(?:\.\d*)?|\.\d+)\s*(mm|cm|m)?$/;
const MM_PER: Record<string, number> = { mm: 1, cm: 10, m: 1000 };

/**
 * Reads a length typed by a user and returns millimetres, or `{ error }` with a message for
 * the field. Imperial: `28'-6 1/2"`, `28' 6 1/2"`, `28'6.5"`, `28'`, `28.5'`, `342.5"`,
 * `342 1/2`, `6 1/2"` (bare numbers are inches; "ft"/"in" words and typographic primes are
 * accepted). Metric: `8687`, `8687 mm`, `868.7 cm`, `8.687 m` (bare numbers are mm).
 */
export const parseLength = (text: string, units: LengthUnits): Mm | ParseError => {
  if (typeof text !== 'string' || text.trim() === '') return { error: 'Enter a length' };
  if (units === 'imperial') {
    const inches = parseImperial(text);
    return isParseError(inches) ? inches : inchToMm(inch(inches));
  }
  const m = METRIC.exec(text.trim().toLowerCase());
  if (!m) return { error: `Can't read "${text.trim()}" as a length; try 8687 mm or 8.687 m` };
  const value = Number(m[2]) * MM_PER[m[3] ?? 'mm'];
  return mm(m[1] ? -value : value);
};

const PITCH = /^(\d+(?:\.\d*)?|\.\d+)\s*(?:(?:\/|:|\s+in\s+)\s*(\d+(?:\.\d*)?|\.\d+))?$/;

/**
 * Roof pitch as rise per 12 of run: `"6/12"`, `"6:12"`, `"6 in 12"`, `"6"` and `"6.5"` give 6
 * or 6.5; another run is scaled (`"4/10"` → 4.8 per 12).
 */
export const parsePitch = (text: string): number | ParseError => {
  if (typeof text !== 'string' || text.trim() === '') return { error: 'Enter a pitch, e.g. 6/12' };
  const m = PITCH.exec(text.trim().toLowerCase());
  if (!m) return { error: `Can't read "${text.trim()}" as a pitch; try 6/12 or 6` };
  const run = m[2] === undefined ? 12 : Number(m[2]);
  if (run === 0) return { error: 'The run of a pitch cannot be 0' };
  return (Number(m[1]) * 12) / run;
};
