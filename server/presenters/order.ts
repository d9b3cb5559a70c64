import type {
  HistoryEntry,
  LineDetail,
  LineSummary,
  OrderDetail,
  OrderSummary,
  ReviewQueueItem,
} from '../../shared/api/orders';
import type { AuditEvent, Order, OrderLine, User } from '../models';
import { summarizePortalEvent } from './portal';
import { formatDay } from '../../shared/api/terms';
import { formatInstantUtc, formatMoney } from '../services/quotePdf/format';
import { plannedDelivery } from '../../shared/engine/schedule';

type Counted = Order & { get(k: 'lineCount' | 'trussCount'): unknown };

export function presentOrderSummary(o: Counted): OrderSummary {
  return {
    id: o.id,
    number: o.number,
    status: o.status,
    job: { id: o.job!.id, name: o.job!.name },
    customer: { id: o.customer!.id, name: o.customer!.name },
    lineCount: Number(o.get('lineCount') ?? 0),
    trussCount: Number(o.get('trussCount') ?? 0),
    createdAt: o.createdAt.toISOString(),
    updatedAt: o.updatedAt.toISOString(),
    promisedOn: o.promisedOn ?? null,
    plannedDeliveryOn: plannedDelivery({
      promisedOn: o.promisedOn ?? null,
      plannedFinishOn: o.plannedFinishOn ?? null,
      plannedLate: o.plannedLate ?? false,
    }),
    onHold: o.onHold ?? false,
    holdReason: o.holdReason ?? null,
    version: o.version ?? 1,
  };
}

export function presentLineSummary(l: OrderLine): LineSummary {
  return {
    id: l.id,
    position: l.position,
    mark: l.mark,
    quantity: l.quantity,
    plies: l.plies,
    profile: l.profile,
    description: l.description,
    designOk: l.designOk,
    maxCsi: l.maxCsi,
    warningCount: l.warningCount,
    reviewState: l.reviewState,
    reviewComment: l.reviewComment,
    reviewedBy: l.reviewer?.name ?? null,
    reviewedAt: l.reviewedAt?.toISOString() ?? null,
    engineVersion: l.engineVersion,
    loadsOutOfDate: l.loadsOutOfDate,
    outOfDateReason: l.outOfDateReason,
    updatedAt: l.updatedAt.toISOString(),
    designVersion: l.designVersion,
  };
}

export function presentLine(l: OrderLine): LineDetail {
  return {
    ...presentLineSummary(l),
    orderId: l.orderId,
    design: l.designInput,
    result: l.designResult,
  };
}

const d = (e: AuditEvent, k: string) => e.data[k] as string | number | undefined;
const day = (e: AuditEvent, k: string) => formatDay(String(d(e, k) ?? ''));

/** One sentence per change, in the desk's words. */
export function summarizeEvent(e: AuditEvent): string {
  switch (e.action) {
    case 'order.created':
      return `Opened order ${d(e, 'number')}`;
    case 'line.added':
      return `Added ${d(e, 'mark')} × ${d(e, 'quantity')}: ${d(e, 'description')}${e.data.ok === false ? ' (design fails its checks)' : ''}`;
    case 'line.updated': {
      const before = (e.data.before ?? {}) as Record<string, unknown>;
      const after = (e.data.after ?? {}) as Record<string, unknown>;
      const parts = ['mark', 'quantity', 'plies', 'description']
        .filter((k) => before[k] !== after[k])
        .map((k) => `${k} ${String(before[k])} → ${String(after[k])}`);
      if (e.data.redesigned && !parts.some((p) => p.startsWith('description')))
        parts.push('design recomputed');
      return `Changed ${d(e, 'mark')}${parts.length ? ': ' + parts.join(', ') : ''}`;
    }
    case 'line.deleted':
      return `Deleted ${d(e, 'mark')} (${d(e, 'description')})`;
    case 'line.copied':
      return `Copied ${d(e, 'from')} as ${d(e, 'mark')}`;
    case 'lines.reordered':
      return `Reordered lines: ${((e.data.marks as string[]) ?? []).join(', ')}`;
    case 'line.approved':
      return `Approved the design of ${d(e, 'mark')}${e.data.comment ? `: ${d(e, 'comment')}` : ''}`;
    case 'quote.created':
      return `Quoted ${d(e, 'reference')}${e.data.total !== undefined ? ` (total ${formatMoney(Number(e.data.total), String(d(e, 'currency') ?? 'USD'))})` : ''}`;
    case 'quote.sent':
      return `Sent ${d(e, 'reference')} to ${d(e, 'to') ?? 'the builder'}`;
    case 'order.reopened':
      return 'Back to draft: lines changed after quoting; the next quote is a new revision';
    case 'lines.out_of_date':
      return `Job loads changed (${d(e, 'change')}): ${((e.data.marks as string[]) ?? []).join(', ')} out of date`;
    case 'line.redesigned':
      return `Redesigned ${d(e, 'mark')} with the job’s current loads${e.data.wasApproved ? '; its approval no longer applies' : ''}${e.data.ok === false ? ' (design fails its checks)' : ''}`;
    case 'line.returned':
      return `Sent ${d(e, 'mark')} back: ${d(e, 'comment')}`;
    case 'order.released':
      return e.data.manual ? `Released by hand: ${d(e, 'reason')}` : 'Released to production';
    case 'order.held':
      return `Held: ${d(e, 'reason')}`;
    case 'order.hold_lifted':
      return `Hold lifted: ${d(e, 'reason')}`;
    case 'order.promised':
      return e.data.from
        ? `Promised date ${day(e, 'from')} → ${day(e, 'to')}: ${d(e, 'reason')}`
        : `Promised delivery on ${day(e, 'to')}`;
    case 'order.moved':
      return `Moved on the schedule to table ${d(e, 'tableId')} from ${day(e, 'date')}`;
    case 'line.progress':
      return `${d(e, 'mark')}: ${d(e, 'count')} of ${d(e, 'quantity')} ${d(e, 'stage')}`;
    case 'order.in_production':
      return 'In production (first cut)';
    case 'order.ready':
      return 'Ready: every truss banded';
    case 'order.delivered':
      return `Delivered, signed for by ${d(e, 'receivedBy')}${e.data.receivedAt ? ` on ${formatInstantUtc(String(e.data.receivedAt))}` : ''}${e.data.note ? `: ${d(e, 'note')}` : ''}`;
    default:
      return summarizePortalEvent(e) ?? e.action;
  }
}

export function presentHistory(events: (AuditEvent & { actor?: User | null })[]): HistoryEntry[] {
  return events.map((e) => ({
    id: Number(e.id),
    at: e.createdAt.toISOString(),
    actor: e.actor?.name ?? null,
    action: e.action,
    summary: summarizeEvent(e),
  }));
}

export function presentOrder(
  o: Counted,
  lines: OrderLine[],
  history: HistoryEntry[],
  units: 'imperial' | 'metric',
): OrderDetail {
  return {
    ...presentOrderSummary(o),
    lines: lines.map(presentLineSummary),
    history,
    units,
    payments: [],
    money: null,
    acceptance: null,
  };
}

export function presentQueueItem(l: OrderLine): ReviewQueueItem {
  const o = l.order!;
  return {
    ...presentLineSummary(l),
    order: { id: o.id, number: o.number },
    job: { id: o.job!.id, name: o.job!.name },
    customer: { id: o.customer!.id, name: o.customer!.name },
  };
}
