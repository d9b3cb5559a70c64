import type { PresentedDesign } from '../../../shared/engine/design';
import { formatFeetInches, formatInches, formatMm } from '../../../shared/engine/format';
import type { ShopOrder } from '../../../shared/api/shopPaper';

/** What the shop documents need of a stored, approved truss line. */
export interface ShopLine {
  id: number;
  mark: string;
  description: string;
  quantity: number;
  plies: number;
  engineVersion: string;
  designInput: Record<string, unknown>;
  design: PresentedDesign;
}

/** The order heading every document, and its lines in order. */
export interface ShopOrderPaper {
  order: ShopOrder;
  lines: ShopLine[];
}

const MM_PER_INCH = 25.4;

/** A design-unit length (in or mm) to mm. */
export const toMm = (design: Pick<PresentedDesign, 'units'>, value: number) =>
  design.units.length === 'mm' ? value : value * MM_PER_INCH;

/** A length in mm to the design's units (in or mm). */
export const fromMm = (design: Pick<PresentedDesign, 'units'>, mm: number) =>
  design.units.length === 'mm' ? mm : mm / MM_PER_INCH;

/** A length in the design's units as the shop reads it: feet-inches-sixteenths or mm. */
export const lengthText = (design: Pick<PresentedDesign, 'units'>, value: number) =>
  design.units.length === 'mm' ? formatMm(value) : formatFeetInches(value * MM_PER_INCH);

/** A short length (a plate slide) in inches-sixteenths or mm. */
export const shortLengthText = (design: Pick<PresentedDesign, 'units'>, value: number) =>
  design.units.length === 'mm' ? formatMm(value) : formatInches(value * MM_PER_INCH);

/** "6/12" from the stored input (rise per 12), or "flat". */
export function pitchText(line: Pick<ShopLine, 'designInput'>): string {
  const pitch = Number(line.designInput.pitch);
  if (line.designInput.profile === 'flat' || !Number.isFinite(pitch)) return 'Flat';
  return `${Number(pitch.toFixed(3))}/12`;
}
