import type { FontName } from './fonts';
import { COLORS, MARGIN, type Doc } from './theme';

/** How one run of text is set. */
export interface TextStyle {
  font?: FontName;
  size?: number;
  color?: string;
  /** Box width for right or centre alignment, and where a too-long text is cut with "…". */
  width?: number;
  align?: 'left' | 'right' | 'center';
  /** Tabular figures, so money and quantities align digit under digit. */
  tabular?: boolean;
}

/** Cut a text with "…" until it fits `width` at the current font. */
export function fit(doc: Doc, s: string, width: number): string {
  if (doc.widthOfString(s) <= width) return s;
  let cut = s;
  while (cut.length > 1 && doc.widthOfString(`${cut}…`) > width) cut = cut.slice(0, -1);
  return `${cut.trimEnd()}…`;
}

/** One line of text placed exactly (never wrapping, never starting a page). */
export function textAt(doc: Doc, s: string, x: number, y: number, style: TextStyle = {}) {
  doc
    .font(style.font ?? 'regular')
    .fontSize(style.size ?? 9)
    .fillColor(style.color ?? COLORS.text);
  const line = style.width ? fit(doc, s, style.width) : s;
  const features = style.tabular ? (['tnum'] as const) : [];
  const w = doc.widthOfString(line, { features: [...features] });
  const left =
    style.align === 'right' && style.width
      ? x + style.width - w
      : style.align === 'center' && style.width
        ? x + (style.width - w) / 2
        : x;
  doc.text(line, left, y, { lineBreak: false, features: [...features] });
}

/** A wrapped paragraph; returns the y below it. */
export function paragraph(
  doc: Doc,
  s: string,
  x: number,
  y: number,
  width: number,
  style: TextStyle = {},
) {
  doc
    .font(style.font ?? 'regular')
    .fontSize(style.size ?? 8.5)
    .fillColor(style.color ?? COLORS.muted);
  doc.text(s, x, y, { width, lineGap: 1.5 });
  return doc.y;
}

/** Height of a wrapped paragraph, to decide whether it fits on the page. */
export function paragraphHeight(doc: Doc, s: string, width: number, style: TextStyle = {}) {
  doc.font(style.font ?? 'regular').fontSize(style.size ?? 8.5);
  return doc.heightOfString(s, { width, lineGap: 1.5 });
}

/** Lowest y content may reach on a page (the footer sits below it). */
export const contentBottom = (doc: Doc) => doc.page.height - MARGIN.bottom;

/** A thin horizontal rule across the content width. */
export function rule(doc: Doc, y: number, color: string = COLORS.rule, x0?: number, x1?: number) {
  doc
    .moveTo(x0 ?? MARGIN.side, y)
    .lineTo(x1 ?? doc.page.width - MARGIN.side, y)
    .lineWidth(0.6)
    .strokeColor(color)
    .stroke();
}
