import type { Express } from 'express';
import { createPlant, createUser } from './factories';
import { signedIn } from './session';

export type Session = Awaited<ReturnType<typeof signedIn>>;

/** A plant with a signed-in sales person and design reviewer: the cast of the order tests. */
export async function salesDesk(app: Express) {
  const plant = await createPlant();
  const sales = await signedIn(app, (await createUser({ role: 'sales', plant })).email);
  const engineer = await signedIn(app, (await createUser({ role: 'engineer', plant })).email);
  return { plant, sales, engineer };
}
