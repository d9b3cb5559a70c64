import { z } from 'zod';

/**
 * `GET /api/tasks`: what waits for the signed-in staff member, per list. A list is present only
 * for the roles it serves (sales: sent back, out of date, new plans; reviewer: waiting for review,
 * new plans; foreman: released to the shop; plant manager: all of them). Each list holds the
 * first few items and the `total`.
 */
const ref = { id: z.number().int(), name: z.string() };
const orderRef = z.object({ id: z.number().int(), number: z.string() });

export const lineTaskSchema = z.object({
  lineId: z.number().int(),
  mark: z.string(),
  description: z.string(),
  order: orderRef,
  job: z.object(ref),
  customer: z.object(ref),
  designOk: z.boolean(),
  /** The reviewer's comment when sent back; the reason when out of date. */
  note: z.string().nullable(),
  at: z.string(),
});
export type LineTask = z.infer<typeof lineTaskSchema>;

export const planTaskSchema = z.object({
  fileId: z.number().int(),
  name: z.string(),
  job: z.object(ref),
  customer: z.object(ref),
  uploadedBy: z.string().nullable(),
  at: z.string(),
});
export type PlanTask = z.infer<typeof planTaskSchema>;

export const orderTaskSchema = z.object({
  order: orderRef,
  job: z.object(ref),
  customer: z.object(ref),
  status: z.string(),
  promisedOn: z.string().nullable(),
  at: z.string(),
});
export type OrderTask = z.infer<typeof orderTaskSchema>;

const list = <T extends z.ZodTypeAny>(item: T) =>
  z.object({ items: z.array(item), total: z.number().int() });

export const tasksSchema = z.object({
  sentBack: list(lineTaskSchema).optional(),
  outOfDate: list(lineTaskSchema).optional(),
  waitingReview: list(lineTaskSchema).optional(),
  newPlans: list(planTaskSchema).optional(),
  releasedToShop: list(orderTaskSchema).optional(),
});
export type Tasks = z.infer<typeof tasksSchema>;
export type TaskListName = keyof Tasks;

/** How many items each list carries; the total says how many more wait. */
export const TASKS_PER_LIST = 8;
/** A plan uploaded within this many days counts as new. */
export const NEW_PLAN_DAYS = 14;
