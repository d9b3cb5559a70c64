import type { Transaction } from 'sequelize';
import { AuditEvent } from '../models';

/** Append one audit event inside the command's transaction. */
export function audit(
  t: Transaction,
  e: {
    plantId: number;
    actorId: number | null;
    action: string;
    subjectType: string;
    subjectId: number | null;
    data?: Record<string, unknown>;
  },
) {
  return AuditEvent.create({ ...e, data: e.data ?? {} }, { transaction: t });
}
