import type PDFDocument from 'pdfkit';

/** A pdfkit document. */
export type Doc = InstanceType<typeof PDFDocument>;

/** The quote's palette: near-black text, one accent, quiet greys for rules and notes. */
export const COLORS = {
  text: '#1f2328',
  muted: '#5b6470',
  faint: '#8a929c',
  rule: '#d5dae0',
  band: '#f3f5f7',
  accent: '#1d5f8c',
  chord: '#1f2328',
  web: '#4a6a86',
  dim: '#6b7480',
  noteBg: '#fbf6e9',
  noteRule: '#e4cf95',
  danger: '#a3261c',
} as const;

/** Page margins (pt); the footer lives inside the bottom margin. */
export const MARGIN = { top: 48, side: 48, bottom: 56 } as const;
