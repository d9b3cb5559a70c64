import { z } from 'zod';

/**
 * Shop paper of an order whose designs are all approved: the plate schedule, truss tags, the
 * delivery ticket and one shop drawing per truss mark. Shapes the server presents and the client
 * parses. Lengths carry their shop text (feet-inches-sixteenths or mm) beside the number.
 */

/** Who may print shop paper (the server enforces the same; never a builder). */
export const SHOP_PAPER_ROLES = ['admin', 'sales', 'foreman'] as const;

const length = z.object({ value: z.number(), text: z.string() });

/** The order as every shop document heads it. */
export const shopOrderSchema = z.object({
  id: z.number().int(),
  number: z.string(),
  status: z.string(),
  plant: z.string(),
  job: z.object({ id: z.number().int(), name: z.string(), address: z.string() }),
  builder: z.object({ id: z.number().int(), name: z.string() }),
  units: z.enum(['imperial', 'metric']),
});
export type ShopOrder = z.infer<typeof shopOrderSchema>;

/** A plate size as picked from the rack (catalog id, gauge, width × length in inches). */
export const plateSizeSchema = z.object({
  plate: z.string(),
  gauge: z.number().int(),
  widthIn: z.number(),
  lengthIn: z.number(),
});
export type PlateSize = z.infer<typeof plateSizeSchema>;

/** One joint's plate: size, both faces, where its centre sits relative to the joint. */
export const jointPlateRowSchema = plateSizeSchema.extend({
  joint: z.string(),
  kind: z.string(),
  /** Plates at this joint per ply: one on each face. */
  faces: z.literal(2),
  /** Plate length axis from horizontal, degrees (counter-clockwise). */
  angleDeg: z.number().nullable(),
  /** Plate centre from the joint, horizontal and vertical (+ right, + up). */
  dx: length.nullable(),
  dy: length.nullable(),
  /** "Centred on the joint" or the slide in words. */
  position: z.string(),
});
export type JointPlateRow = z.infer<typeof jointPlateRowSchema>;

/** A plate size with a count. */
export const plateCountSchema = plateSizeSchema.extend({ count: z.number().int() });
export type PlateCount = z.infer<typeof plateCountSchema>;

/** Per truss mark: each joint's plate, the plates of one truss and of the whole line. */
export const markPlatesSchema = z.object({
  lineId: z.number().int(),
  mark: z.string(),
  description: z.string(),
  quantity: z.number().int(),
  plies: z.number().int(),
  joints: z.array(jointPlateRowSchema),
  /** Plates of one truss (all its plies, both faces). */
  perTruss: z.array(plateCountSchema),
  /** perTruss × quantity. */
  line: z.array(plateCountSchema),
});
export type MarkPlates = z.infer<typeof markPlatesSchema>;

/** `GET /api/orders/:id/shop-paper/plates`. */
export const plateScheduleSchema = z.object({
  order: shopOrderSchema,
  /** The counting rule in words (faces, plies). */
  rule: z.string(),
  marks: z.array(markPlatesSchema),
  /** What to pick from the rack for the whole order, largest plates first. */
  totals: z.array(plateCountSchema),
  totalPlates: z.number().int(),
  demoPlates: z.boolean(),
  cautions: z.array(z.string()),
});
export type PlateSchedule = z.infer<typeof plateScheduleSchema>;

/** One truss tag: exactly one per truss built. */
export const trussTagSchema = z.object({
  lineId: z.number().int(),
  mark: z.string(),
  /** This truss's number within its mark, 1…of. */
  n: z.number().int(),
  of: z.number().int(),
  span: z.string(),
  pitch: z.string(),
  plies: z.number().int(),
  /** Estimated weight of the lumber, all plies: number and text ("112 lb" or "51 kg"). */
  weight: z.object({ value: z.number(), unit: z.enum(['lb', 'kg']), text: z.string() }),
  /** Absolute address of the truss's page in Spanwise (the QR code's content). */
  url: z.string(),
});
export type TrussTag = z.infer<typeof trussTagSchema>;

/** `GET /api/orders/:id/shop-paper/tags`. */
export const trussTagsSchema = z.object({
  order: shopOrderSchema,
  tags: z.array(trussTagSchema),
  /** Do-not-cut warning printed on every tag. */
  warning: z.string(),
  /** How the weight is estimated, with its source. */
  weightBasis: z.string(),
});
export type TrussTags = z.infer<typeof trussTagsSchema>;

/** Tag PDF layouts: a letter sheet of 4 × 2 in labels (2 × 5), or one 4 × 6 in label per page. */
export const TAG_LAYOUTS = ['sheet', 'label'] as const;
export type TagLayout = (typeof TAG_LAYOUTS)[number];
export const tagPdfQuerySchema = z.object({
  layout: z.enum(TAG_LAYOUTS, { message: 'Layout is "sheet" or "label".' }).default('sheet'),
});

/** One bundle on the truck: trusses of one mark banded together. */
export const bundleSchema = z.object({
  number: z.number().int(),
  mark: z.string(),
  description: z.string(),
  count: z.number().int(),
  /** Which of the mark's trusses, e.g. "1–10 of 24". */
  trusses: z.string(),
  weight: z.object({ value: z.number(), unit: z.enum(['lb', 'kg']), text: z.string() }),
});
export type Bundle = z.infer<typeof bundleSchema>;

/** `GET /api/orders/:id/shop-paper/delivery`. */
export const deliveryTicketSchema = z.object({
  order: shopOrderSchema,
  bundles: z.array(bundleSchema),
  marks: z.array(z.object({ mark: z.string(), description: z.string(), count: z.number().int() })),
  totalTrusses: z.number().int(),
  totalWeight: z.object({ value: z.number(), unit: z.enum(['lb', 'kg']), text: z.string() }),
  bundleRule: z.string(),
  cautions: z.array(z.string()),
});
export type DeliveryTicket = z.infer<typeof deliveryTicketSchema>;

const point = z.tuple([z.number(), z.number()]);

/** A dimension between two points of the drawing, with its text. */
export const dimensionSchema = z.object({
  from: point,
  to: point,
  /** Which side the dimension line sits on, in drawing units from the measured points. */
  offset: z.number(),
  text: z.string(),
});
export type Dimension = z.infer<typeof dimensionSchema>;

/**
 * The drawing of one truss mark in its design units (in or mm, y up): member outlines as
 * polygons, plates as polygons, labels and dimension chains to panel points.
 */
export const shopDrawingGeometrySchema = z.object({
  outlines: z.array(z.object({ piece: z.string(), role: z.string(), points: z.array(point) })),
  plates: z.array(z.object({ joint: z.string(), plate: z.string(), points: z.array(point) })),
  pieceLabels: z.array(z.object({ text: z.string(), at: point })),
  jointLabels: z.array(z.object({ text: z.string(), at: point })),
  dimensions: z.array(dimensionSchema),
  bounds: z.object({ minX: z.number(), minY: z.number(), maxX: z.number(), maxY: z.number() }),
});
export type ShopDrawingGeometry = z.infer<typeof shopDrawingGeometrySchema>;

/** `GET /api/orders/:id/shop-paper/lines/:lineId`: one sheet of the shop drawing set. */
export const shopDrawingSchema = z.object({
  order: shopOrderSchema,
  lineId: z.number().int(),
  mark: z.string(),
  description: z.string(),
  quantity: z.number().int(),
  plies: z.number().int(),
  span: z.string(),
  pitch: z.string(),
  rise: z.string(),
  heelHeight: z.string(),
  geometry: shopDrawingGeometrySchema,
  pieces: z.array(
    z.object({
      mark: z.string(),
      role: z.string(),
      lumber: z.string(),
      length: z.string(),
      count: z.number().int(),
    }),
  ),
  plates: z.array(jointPlateRowSchema),
  bracing: z.array(z.string()),
  demoPlates: z.boolean(),
  engineVersion: z.string(),
  cautions: z.array(z.string()),
  /** A girder's ply-to-ply fastening per chord, in words; absent for one ply. */
  plyFastening: z.array(z.string()).optional(),
});
export type ShopDrawing = z.infer<typeof shopDrawingSchema>;

/** `GET /api/orders/:id/shop-paper`: what there is to print for the order. */
export const shopPaperIndexSchema = z.object({
  order: shopOrderSchema,
  marks: z.array(
    z.object({
      lineId: z.number().int(),
      mark: z.string(),
      description: z.string(),
      quantity: z.number().int(),
      plies: z.number().int(),
    }),
  ),
  totalTrusses: z.number().int(),
});
export type ShopPaperIndex = z.infer<typeof shopPaperIndexSchema>;
