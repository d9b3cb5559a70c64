import { beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { testApp } from '../../../support/db';
import {
  createCustomer,
  createJob,
  createLine,
  createOrder,
  createPlant,
  createUser,
  FINK_24,
} from '../../../support/factories';
import { signedIn } from '../../../support/session';
import type { Role } from '../../../../shared/api/roles';
import { ENGINE_VERSION } from '../../../../shared/engine/version';
import { Quote, type Order, type OrderLine, type User } from '../../../../server/models';
import { binary, keep, pdfPages, pdfPngs, pdfText } from '../shopPaper/helpers';

const ROLES: Role[] = ['admin', 'sales', 'engineer', 'foreman', 'builder'];
const app = testApp();
const users = {} as Record<Role, User>;
let ours: Order;
let fink: OrderLine; // approved, 24 ft Fink with 2 ft overhangs and snow
let mono: OrderLine; // approved, 14 ft mono, 2 plies, net wind uplift
let scissor: OrderLine; // approved, 28 ft 6/12 scissor on a roller bearing
let girder: OrderLine; // approved, 24 ft 3-ply Fink girder carrying three trusses
let doubleFink: OrderLine; // approved, 36 ft 8/12 double Fink: 22 members, 11 joints
let pending: OrderLine; // waiting for review, never quoted
let quoted: OrderLine; // waiting for review, but in a quote sent to the builder
let theirs: { order: Order; line: OrderLine };

const FINK = { ...FINK_24, overhang: 24, loads: { ...FINK_24.loads, snow: { pg: 30 } } };
const MONO = {
  ...FINK_24,
  profile: 'mono',
  span: 168,
  pitch: 4,
  overhang: 18,
  loads: { ...FINK_24.loads, windUplift: 12 },
} as const;
const SCISSOR = { ...FINK_24, profile: 'scissor', span: 336, pitch: 6, bottomPitch: 3 } as const;
const DOUBLE_FINK = {
  ...FINK_24,
  profile: 'doubleFink',
  span: 432,
  pitch: 8,
  overhang: 24,
} as const;
// Three carried trusses' reactions hung on the bottom chord (demo loads, 2 ft o.c. jacks).
const GIRDER = {
  ...FINK_24,
  pointLoads: [72, 144, 216].map((x, i) => ({
    x,
    chord: 'bottom',
    dead: 450,
    live: 600,
    kind: 'roofLive',
    label: `J${i + 1}`,
  })),
} as const;

beforeAll(async () => {
  const plant = await createPlant();
  await plant.update({ settings: { phone: '(555) 010-7000', email: 'desk@plant.test' } });
  const customer = await createCustomer({ plant });
  for (const role of ROLES) users[role] = await createUser({ role, plant, customer });
  ours = await createOrder({ job: await createJob({ customer }) });
  fink = await createLine({ order: ours, mark: 'T1', design: FINK, reviewState: 'approved' });
  mono = await createLine({
    order: ours,
    mark: 'M1',
    design: MONO,
    plies: 2,
    reviewState: 'approved',
  });
  scissor = await createLine({ order: ours, mark: 'S1', design: SCISSOR, reviewState: 'approved' });
  girder = await createLine({
    order: ours,
    mark: 'G1',
    design: GIRDER,
    plies: 3,
    reviewState: 'approved',
  });
  doubleFink = await createLine({
    order: ours,
    mark: 'D1',
    design: DOUBLE_FINK,
    reviewState: 'approved',
  });
  pending = await createLine({ order: ours, mark: 'T2' });
  quoted = await createLine({ order: ours, mark: 'T3' });
  await Quote.create({
    plantId: plant.id,
    orderId: ours.id,
    number: 1,
    reference: `${ours.number}-Q1`,
    snapshot: { designs: [{ mark: 'T3' }] },
    total: 100,
    depositDue: 0,
    validUntil: '2099-01-01',
    createdBy: users.sales.id,
    sentAt: new Date(),
  });
  const other = await createOrder({
    customer: await createCustomer({ plant: await createPlant() }),
  });
  theirs = { order: other, line: await createLine({ order: other, reviewState: 'approved' }) };
});

const path = (o: Order, l: OrderLine) => `/api/orders/${o.id}/lines/${l.id}/design-drawing.pdf`;
const get = async (role: Role, p: string) =>
  (await signedIn(app, users[role].email)).agent.get(p).buffer(true).parse(binary);

/**
 * What IRC 2021 §R802.10.1 lists for a truss design drawing, as the printed words that carry it
 * (headings print in capitals; matched without case).
 */
const R802_10_1: [string, RegExp][] = [
  ['slope or pitch', /Slope \(pitch\)/],
  ['span', /Span \(out to out\)/],
  ['spacing', /Spacing\s+24 in\. o\.c\./],
  ['location of all joints', /x from left\s+y above brg/],
  ['required bearing widths', /Bearing\s+Min\. req\./],
  ['TCLL', /TCLL\s+20 psf/],
  ['TCDL', /TCDL\s+10 psf/],
  ['BCLL', /BCLL\s+0 psf/],
  ['BCDL', /BCDL\s+10 psf/],
  ['snow load', /Snow\s+/],
  ['wind load', /Wind\s+/],
  ['concentrated loads and points of application', /Concentrated loads\s+None/],
  [
    'adjustments to lumber and plate values',
    /ADJUSTMENTS FOR CONDITIONS OF USE[\s\S]*Load duration CD/,
  ],
  ['maximum reactions and uplift', /Down\s+Uplift\s+Horiz\./],
  ['connector type, size and location at each joint', /Connector\s+Plate size\s+Plate position/],
  [
    'lumber size, species and grade per member',
    /Lumber \(size, species, grade\)[\s\S]*2x4 Spruce-Pine-Fir/,
  ],
  ['truss-to-girder connection', /Truss-to-girder/],
  ['ply-to-ply connection', /Ply-to-ply/],
  [
    'deflection ratio and maximum, live load',
    /Live-load vertical\s+L\/\d+ \(limit L\/240\), max \d\.\d{3} in\./,
  ],
  ['deflection ratio and maximum, total load', /Total-load vertical\s+L\/\d+ \(limit L\/180\)/],
  ['horizontal deflection', /Horizontal\s+Bearing \w+ slides/],
  ['maximum web compression', /Maximum web compression [\d,]+ lbf in \w+/],
  [
    'permanent bracing / restraint',
    /WEB COMPRESSION AND BRACING[\s\S]*Top chord: braced out of plane by the roof sheathing[\s\S]*Bottom chord: braced out of plane by the ceiling/,
  ],
];

describe('truss design drawing PDF (IRC 2021 R802.10.1)', () => {
  // What a scissor and a girder print instead for the items that depend on the truss.
  const scissorItems: Record<string, RegExp> = {
    'horizontal deflection': /Horizontal\s+\d\.\d{3} in\. (outward|inward) at roller \w+/,
  };
  const girderItems: Record<string, RegExp> = {
    'concentrated loads and points of application':
      /Concentrated loads\s+J1 at 6'-0", bottom chord: D 450 \+ Lr 600 lb/,
    'truss-to-girder connection': /Truss-to-girder\s+Girder: carries/,
    'ply-to-ply connection':
      /Ply-to-ply\s+3 plies, fastened chord by chord:[\s\S]*Bottom chord\s+10d common nails/,
  };
  for (const [name, which, instead] of [
    ['Fink', () => fink, {}],
    ['mono', () => mono, {}],
    ['scissor', () => scissor, scissorItems],
    ['girder', () => girder, girderItems],
    // Many members: the adjustments move into the foot band to keep one sheet.
    ['double Fink', () => doubleFink, {}],
  ] as const) {
    it(`a ${name} prints every R802.10.1 item, the cautions and the engine on one sheet`, async () => {
      const line = which();
      const res = await get('engineer', path(ours, line));
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toBe('application/pdf');
      const pdf = res.body as Buffer;
      keep(`design-drawing-${name}.pdf`, pdf);
      const text = pdfText(pdf);
      const items: Record<string, RegExp> = instead;
      for (const [item, pattern] of R802_10_1) expect(text, item).toMatch(items[item] ?? pattern);
      // Every joint of the design is listed with its plate.
      const design = line.designResult as { joints: { id: string }[] };
      for (const j of design.joints) expect(text).toMatch(new RegExp(`\\n\\s*${j.id}\\s+\\d+'-`));
      expect(text).toContain('Results are preliminary until the design is reviewed');
      expect(text).toContain('Local codes govern');
      expect(text).toContain(`Spanwise engine ${ENGINE_VERSION}`);
      expect(text).toContain('(555) 010-7000');
      expect(text).toContain('desk@plant.test');
      expect(pdfPages(pdf)).toHaveLength(1);
      keep(`design-drawing-${name}.png`, pdfPngs(pdf, 110)[0]);
    });
  }

  it('the Fink draws its overhangs and the mono its two plies', async () => {
    const f = pdfText((await get('sales', path(ours, fink))).body as Buffer);
    expect(f).toMatch(/2'-0" overhang[\s\S]*2'-0" overhang/);
    expect(f).toMatch(/Overhangs\s+2'-0" each end/);
    const m = pdfText((await get('sales', path(ours, mono))).body as Buffer);
    expect(m).toMatch(/1'-6" overhang/);
    expect(m).toMatch(/Overhangs\s+1'-6" left, none right/);
    expect(m).toMatch(/Ply-to-ply\s+2 plies/);
    expect(m).toMatch(/Wind\s+net uplift 12 psf/);
  });
});

describe('truss design drawing: who receives it', () => {
  for (const role of ['admin', 'sales', 'engineer'] as const)
    it(`${role} prints any line of the plant's order, reviewed or not`, async () => {
      for (const l of [fink, pending]) expect((await get(role, path(ours, l))).status).toBe(200);
    });

  it('the shop foreman is refused (403)', async () => {
    expect((await get('foreman', path(ours, fink))).status).toBe(403);
  });

  it('the builder receives approved and quoted lines; any other line answers 404', async () => {
    expect((await get('builder', path(ours, fink))).status).toBe(200);
    expect((await get('builder', path(ours, quoted))).status).toBe(200);
    expect((await get('builder', path(ours, pending))).status).toBe(404);
    // By mark, as the builder's quote page links them.
    const byMark = (mark: string) => `/api/orders/${ours.id}/design-drawings/${mark}.pdf`;
    expect((await get('builder', byMark('T1'))).status).toBe(200);
    expect((await get('builder', byMark('T2'))).status).toBe(404);
    expect((await get('builder', byMark('NOPE'))).status).toBe(404);
  });

  it("another plant's order answers 404 to every role; a line of another order too", async () => {
    for (const role of ROLES)
      expect((await get(role, path(theirs.order, theirs.line))).status, role).toBe(404);
    expect((await get('sales', path(ours, theirs.line))).status).toBe(404);
  });

  it('signed out answers 401', async () => {
    expect((await request(app).get(path(ours, fink))).status).toBe(401);
  });
});
