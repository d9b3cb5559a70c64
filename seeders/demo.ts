/**
 * The demo scenario — every name, address and e-mail here is invented. Idempotent: running it again
 * finds what exists and adds only what is missing. Never used by tests.
 */
import { seedShopPlans } from './shopPlans';
import bcrypt from 'bcryptjs';
import { Customer, Job, Plant, User } from '../server/models';
import { DEMO_PASSWORD, DEMO_SIGN_INS } from '../shared/api/demo';
import { seedOrders } from './orders';
import { seedPriceBook } from './priceBook';
import { seedScenario } from './scenario';

const CUSTOMERS = [
  {
    name: 'Whitaker Homes',
    email: 'office@whitaker-homes.test',
    phone: '(555) 014-2201',
    terms: 'account',
    city: 'Millbrook',
    billingAddress: '118 Quarry Road, Millbrook',
  },
  {
    name: 'Castillo & Reed Builders',
    email: 'estimating@castilloreed.test',
    phone: '(555) 014-3377',
    terms: 'deposit',
    city: 'Fenwick Falls',
    billingAddress: '42 Tanner Street, Fenwick Falls',
  },
  {
    name: 'Stonebrook Residential',
    email: 'jobs@stonebrook.test',
    phone: '(555) 014-8810',
    terms: 'account',
    city: 'Millbrook',
    billingAddress: '9 Ledger Lane, Millbrook',
  },
  {
    name: 'Alder Creek Construction',
    email: 'hello@aldercreek.test',
    phone: '(555) 014-5522',
    terms: 'deposit',
    city: 'Harlow Bend',
    billingAddress: '300 Mill Race Drive, Harlow Bend',
  },
  {
    name: 'Greywater Custom Homes',
    email: 'info@greywater.test',
    phone: null,
    terms: 'deposit',
    city: 'Ostend Ridge',
    billingAddress: '77 Signal Hill, Ostend Ridge',
  },
] as const;

const JOBS: { customer: number; name: string; address: string; planRevision: string | null }[] = [
  {
    customer: 0,
    name: 'Lot 14 — Orchard View',
    address: '14 Orchard View Court, Millbrook',
    planRevision: 'Rev C',
  },
  {
    customer: 0,
    name: 'Lot 15 — Orchard View',
    address: '15 Orchard View Court, Millbrook',
    planRevision: 'Rev B',
  },
  {
    customer: 0,
    name: 'Kessler garage addition',
    address: '2210 Old Ferry Road, Millbrook',
    planRevision: null,
  },
  {
    customer: 1,
    name: 'Tanner Street duplex',
    address: '61 Tanner Street, Fenwick Falls',
    planRevision: 'Rev A',
  },
  {
    customer: 1,
    name: 'Birchwood ranch',
    address: '5 Birchwood Loop, Fenwick Falls',
    planRevision: 'Rev D',
  },
  {
    customer: 2,
    name: 'Ledger Lane townhomes, block 2',
    address: '20–28 Ledger Lane, Millbrook',
    planRevision: 'Rev B',
  },
  {
    customer: 2,
    name: 'Clubhouse pavilion',
    address: '1 Commons Green, Millbrook',
    planRevision: 'Rev A',
  },
  {
    customer: 3,
    name: 'Mill Race farmhouse',
    address: '412 Mill Race Drive, Harlow Bend',
    planRevision: 'Rev A',
  },
  {
    customer: 3,
    name: 'Harlow Bend workshop',
    address: '88 Kiln Road, Harlow Bend',
    planRevision: null,
  },
  {
    customer: 4,
    name: 'Signal Hill cottage',
    address: '79 Signal Hill, Ostend Ridge',
    planRevision: 'Rev E',
  },
];

/** Seed the demo plant, its people, builders and jobs. */
export async function seedDemo() {
  const [plant] = await Plant.findOrCreate({
    where: { name: 'Cedar Ridge Truss Works' },
    defaults: {
      name: 'Cedar Ridge Truss Works',
      units: 'imperial',
      address: '4400 Sawmill Parkway, Millbrook',
    },
  });
  // Contact details printed on quotes and design drawings (invented).
  if (!plant.settings?.phone)
    await plant.update({
      settings: { ...plant.settings, phone: '(555) 014-4400', email: 'desk@cedarridge.example' },
    });
  const customers: Customer[] = [];
  for (const c of CUSTOMERS) {
    const [row] = await Customer.findOrCreate({
      where: { plantId: plant.id, name: c.name },
      defaults: { ...c, plantId: plant.id },
    });
    customers.push(row);
  }
  const hash = await bcrypt.hash(DEMO_PASSWORD, 10);
  for (const u of DEMO_SIGN_INS) {
    const customerId =
      u.email === 'builder1@spanwise.test'
        ? customers[0].id
        : u.email === 'builder2@spanwise.test'
          ? customers[1].id
          : null;
    await User.findOrCreate({
      where: { email: u.email },
      defaults: { ...u, plantId: plant.id, customerId, passwordHash: hash, lastSignInAt: null },
    });
  }
  for (const j of JOBS) {
    const customer = customers[j.customer];
    await Job.findOrCreate({
      where: { plantId: plant.id, customerId: customer.id, name: j.name },
      defaults: {
        plantId: plant.id,
        customerId: customer.id,
        name: j.name,
        address: j.address,
        planRevision: j.planRevision,
      },
    });
  }
  await seedOrders(plant);
  await seedPriceBook(plant);
  // Orders past "quote sent": portal, payments, shop, schedule, floor and delivery.
  await seedScenario(plant);
  await seedShopPlans(plant);
  return plant;
}
