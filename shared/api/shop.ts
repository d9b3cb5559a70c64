import { z } from 'zod';
import type { OrderStatus } from './orders';

/** What the shop pages show and export: formats of `GET /api/shop/orders/:id/cut-list`. */
export const CUT_LIST_FORMATS = ['json', 'csv', 'pdf'] as const;
export type CutListFormat = (typeof CUT_LIST_FORMATS)[number];

/** Query of `GET /api/shop/orders/:id/cut-list` (the `.csv` and `.pdf` paths set it for you). */
export const cutListQuerySchema = z.object({
  format: z.enum(CUT_LIST_FORMATS, { error: 'Format must be json, csv or pdf' }).default('json'),
});
export type CutListQuery = z.infer<typeof cutListQuerySchema>;

/** An order ready for the shop: every truss line's design is approved. */
export interface ShopOrder {
  id: number;
  number: string;
  status: OrderStatus;
  job: { id: number; name: string };
  customer: { id: number; name: string };
  lineCount: number;
  trussCount: number;
  updatedAt: string;
}

/** One end of a piece as cut: where it sits, its cut and angles in words, e.g. "single bevel 26.6°". */
export interface CutListEnd {
  joint: string;
  site: 'heel' | 'tail' | 'peak' | 'splice' | 'panelPoint';
  kind: 'square' | 'single' | 'double' | 'multiple';
  /** Degrees to the board's edges (90 = square), to 0.1°. */
  angles: number[];
  /** Double bevel: point from the reference edge, in the order's units (in or mm). */
  point?: number;
  text: string;
}

/** One row: a distinct piece and how many to cut. */
export interface CutListRowView {
  mark: string;
  truss: string;
  piece: string;
  role: 'topChord' | 'bottomChord' | 'web';
  /** Long-point length in the order's units (in or mm) and as printed (ft-in-16ths or mm). */
  length: { value: number; text: string };
  ends: [CutListEnd, CutListEnd];
  referenceEdge: string;
  notes: string[];
  perTruss: number;
  trusses: number;
  plies: number;
  quantity: number;
}

export interface CutListGroupView {
  lumber: string;
  label: string;
  quantity: number;
  /** Total long-point length to cut, in feet (imperial) or metres (metric), as printed. */
  totalLength: string;
  rows: CutListRowView[];
}

/** `GET /api/shop/orders/:id/cut-list`. */
export interface CutListView {
  order: ShopOrder;
  units: 'imperial' | 'metric';
  /** How the rows are sorted, in words (common practice). */
  sortedBy: string;
  groups: CutListGroupView[];
  quantity: number;
  /** Engine version that computed the pieces, and the versions of the approved designs. */
  engineVersion: string;
  designEngineVersions: string[];
  cautions: string[];
  computedAt: string;
}
