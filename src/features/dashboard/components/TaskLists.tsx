import type { ReactNode } from 'react';
import { Link } from 'react-router';
import {
  NEW_PLAN_DAYS,
  type LineTask,
  type OrderTask,
  type PlanTask,
  type Tasks,
} from '../../../../shared/api/tasks';
import { Badge, Card, EmptyState, QueryState, focusRing } from '../../../components/ui';
import { formatDate, formatDateTime } from '../../../lib/format';
import { useTasks } from '../api/get-tasks';
import { TextLink } from './links';

/** One task: the whole row is one link (one tab stop, Enter opens it). */
function TaskRow({ to, children }: { to: string; children: ReactNode }) {
  return (
    <li>
      <Link
        to={to}
        className={`block px-4 py-3 text-sm text-sand-800 hover:bg-sand-50 focus-visible:bg-sand-50 ${focusRing}`}
      >
        {children}
      </Link>
    </li>
  );
}

function TaskList<T>(props: {
  title: string;
  list: { items: T[]; total: number };
  empty: string;
  more?: { to: string; label: string };
  row: (item: T) => { key: string | number; to: string; body: ReactNode };
}) {
  const { title, list, empty, more, row } = props;
  return (
    <Card
      title={`${title}${list.total > 0 ? ` (${list.total})` : ''}`}
      actions={more ? <TextLink to={more.to}>{more.label}</TextLink> : undefined}
      flush
    >
      {list.items.length === 0 ? (
        <EmptyState title={empty} />
      ) : (
        <ul className="divide-y divide-sand-200" aria-label={title}>
          {list.items.map((item) => {
            const r = row(item);
            return (
              <TaskRow key={r.key} to={r.to}>
                {r.body}
              </TaskRow>
            );
          })}
        </ul>
      )}
      {list.total > list.items.length ? (
        <p className="border-t border-sand-200 px-4 py-2 text-sm text-sand-600">
          {list.total - list.items.length} more not shown.
        </p>
      ) : null}
    </Card>
  );
}

const headline = (main: ReactNode, side?: ReactNode) => (
  <span className="flex flex-wrap items-baseline justify-between gap-x-3">
    <span className="font-semibold text-timber-700">{main}</span>
    {side ? <span className="text-sand-600">{side}</span> : null}
  </span>
);

const lineWhere = (t: LineTask) =>
  `${t.description} · order ${t.order.number} · ${t.job.name} (${t.customer.name})`;

const lineRows = {
  sentBack: (t: LineTask) => ({
    key: t.lineId,
    to: `/orders/${t.order.id}/lines/${t.lineId}`,
    body: (
      <>
        {headline(`Fix ${t.mark}`, `sent back ${formatDateTime(t.at)}`)}
        <span className="block">{lineWhere(t)}</span>
        {t.note ? <span className="block text-warning-800">“{t.note}”</span> : null}
      </>
    ),
  }),
  outOfDate: (t: LineTask) => ({
    key: t.lineId,
    to: `/orders/${t.order.id}`,
    body: (
      <>
        {headline(`Redesign ${t.mark}`, 'designed with old loads')}
        <span className="block">{lineWhere(t)}</span>
        {t.note ? <span className="block text-sand-600">{t.note}</span> : null}
      </>
    ),
  }),
  waitingReview: (t: LineTask) => ({
    key: t.lineId,
    to: `/reviews/${t.lineId}?order=${t.order.id}`,
    body: (
      <>
        {headline(
          <>
            Review {t.mark}{' '}
            {t.designOk ? (
              <Badge tone="success">Passes</Badge>
            ) : (
              <Badge tone="danger">Fails its checks</Badge>
            )}
          </>,
          `designed ${formatDateTime(t.at)}`,
        )}
        <span className="block">{lineWhere(t)}</span>
      </>
    ),
  }),
};

const planRow = (t: PlanTask) => ({
  key: t.fileId,
  to: `/jobs/${t.job.id}/files`,
  body: (
    <>
      {headline(t.name, formatDateTime(t.at))}
      <span className="block">
        {t.job.name} ({t.customer.name}){t.uploadedBy ? ` · uploaded by ${t.uploadedBy}` : ''}
      </span>
    </>
  ),
});

const STATUS: Record<string, string> = {
  released: 'Released, not started',
  in_production: 'In production',
};

const shopRow = (t: OrderTask) => ({
  key: t.order.id,
  to: `/shop/orders/${t.order.id}`,
  body: (
    <>
      {headline(
        `Order ${t.order.number}`,
        t.promisedOn ? `promised ${formatDate(t.promisedOn)}` : 'no promised date',
      )}
      <span className="block">
        {t.job.name} ({t.customer.name}) · {STATUS[t.status] ?? t.status}
      </span>
    </>
  ),
});

/** One list of the home page: its words and how it shows a row. */
interface Section<T> {
  title: string;
  empty: string;
  more?: { to: string; label: string };
  row: (item: T) => { key: string | number; to: string; body: ReactNode };
}

type ItemOf<K extends keyof Tasks> = NonNullable<Tasks[K]>['items'][number];

/** Every list a role may get, in the order the work usually comes. */
const SECTIONS: { [K in keyof Tasks]-?: Section<ItemOf<K>> } = {
  sentBack: {
    title: 'Sent back by the reviewer',
    empty: 'No designs have been sent back',
    row: lineRows.sentBack,
  },
  outOfDate: {
    title: 'Designed with old loads',
    empty: 'Every line has its job’s current loads',
    row: lineRows.outOfDate,
  },
  waitingReview: {
    title: 'Designs waiting for review',
    empty: 'Nothing is waiting for review',
    more: { to: '/reviews', label: 'Open the review queue' },
    row: lineRows.waitingReview,
  },
  newPlans: {
    title: `New plans (last ${NEW_PLAN_DAYS} days)`,
    empty: 'No new plans',
    row: planRow,
  },
  releasedToShop: {
    title: 'Released to the shop',
    empty: 'No orders are released yet',
    more: { to: '/shop', label: 'Ready for the shop' },
    row: shopRow,
  },
};

/** One section when the role has that list. */
function ListOf<K extends keyof Tasks>({ name, tasks }: { name: K; tasks: Tasks }) {
  const list = tasks[name];
  if (!list) return null;
  const section = SECTIONS[name] as Section<ItemOf<K>>;
  return <TaskList {...section} list={list as NonNullable<Tasks[K]>} />;
}

/** The lists of one role's home page. */
function Lists({ tasks }: { tasks: Tasks }) {
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      {(Object.keys(SECTIONS) as (keyof Tasks)[]).map((name) => (
        <ListOf key={name} name={name} tasks={tasks} />
      ))}
    </div>
  );
}

/** What waits for the signed-in staff member, each row a link to where it is done. */
export function TaskLists() {
  const tasks = useTasks();
  return (
    <section aria-label="Your tasks">
      <QueryState query={tasks} what="your tasks">
        {(t) => <Lists tasks={t} />}
      </QueryState>
    </section>
  );
}
