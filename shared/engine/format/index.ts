/** Length and pitch text for the edges (forms, tables, printouts): formatting and parsing. */
export {
  formatFeetInches,
  formatInches,
  formatMm,
  type ImperialFormatOptions,
  type MetricFormatOptions,
} from './lengths';
export { parseLength, parsePitch, isParseError, type ParseError, type LengthUnits } from './parse';
