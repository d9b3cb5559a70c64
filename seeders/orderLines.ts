/** Demo order lines: invented jobs and trusses, designed by the engine when seeded. */
const base = {
  units: 'imperial',
  heelHeight: 0,
  spacing: 24,
  loads: { tcll: 20, tcdl: 10, bcll: 0, bcdl: 10 },
};

/** The demo orders and their truss lines (every line must design ok: see its test). */
export const ORDERS: {
  job: string;
  number: string;
  lines: { mark: string; quantity: number; design: object; review?: 'approved' | 'returned' }[];
}[] = [
  {
    job: 'Lot 14 — Orchard View',
    number: '2026-0001',
    lines: [
      {
        mark: 'T1',
        quantity: 14,
        design: { ...base, profile: 'fink', span: 336, pitch: 6, overhang: 18 },
        review: 'approved',
      },
      {
        mark: 'T2',
        quantity: 2,
        design: { ...base, profile: 'kingPost', span: 168, pitch: 6, overhang: 18 },
      },
      {
        mark: 'T3',
        quantity: 6,
        design: { ...base, profile: 'scissor', span: 288, pitch: 6, bottomPitch: 2, overhang: 18 },
      },
    ],
  },
  {
    job: 'Tanner Street duplex',
    number: '2026-0002',
    lines: [
      {
        mark: 'T1',
        quantity: 22,
        design: {
          ...base,
          profile: 'howe',
          span: 360,
          pitch: 5,
          overhang: 12,
          loads: { ...base.loads, snow: { pg: 30 } },
        },
      },
      {
        mark: 'T2',
        quantity: 4,
        design: { ...base, profile: 'mono', span: 144, pitch: 4, overhang: 12 },
        review: 'returned',
      },
    ],
  },
  {
    job: 'Mill Race farmhouse',
    number: '2026-0003',
    lines: [
      {
        mark: 'T1',
        quantity: 18,
        design: { ...base, profile: 'doubleFink', span: 432, pitch: 8, overhang: 24 },
      },
    ],
  },
];
