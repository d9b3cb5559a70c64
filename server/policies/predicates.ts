import type { RequestHandler } from 'express';
import type { Role } from '../../shared/api/roles';
import type { User } from '../models';
import { forbidden } from '../errors';

/** A policy predicate: may this user act (on this record, when there is one)? */
export type Predicate<R = unknown> = (actor: User, record: R) => boolean;

export const hasRole =
  (...roles: Role[]): Predicate =>
  (actor) =>
    roles.includes(actor.role);

export const isStaff: Predicate = (actor) => actor.role !== 'builder';

export const samePlant: Predicate<{ plantId: number }> = (actor, record) =>
  record.plantId === actor.plantId;

/** Builders reach only their own company's records; staff their plant's. */
export const ownCompany: Predicate<{ plantId: number; customerId: number | null }> = (
  actor,
  record,
) =>
  samePlant(actor, record) && (actor.role !== 'builder' || record.customerId === actor.customerId);

export const all =
  <R>(...ps: Predicate<R>[]): Predicate<R> =>
  (actor, record) =>
    ps.every((p) => p(actor, record));

/** authorize: 403 unless the predicate holds for the signed-in user and the loaded record. */
export function authorize<R>(predicate: Predicate<R>): RequestHandler {
  return (req, res, next) => {
    if (!predicate(req.user!, res.locals.record as R)) return next(forbidden());
    next();
  };
}
