import { orderStatusLabel } from '../../../../shared/api/orderStatus';
import { Link } from 'react-router';
import { Badge, Card, EmptyState, QueryState, focusRing } from '../../../components/ui';
import { usePortalJobs } from '../api/list-jobs';

const rowLink = `block rounded px-1 py-2 text-timber-700 underline underline-offset-2 hover:bg-sand-50 ${focusRing}`;

/** Every job of the builder's company, each order a link; a draft is still being priced. */
export function PortalJobs() {
  const jobs = usePortalJobs();
  return (
    <Card title="All your jobs">
      <QueryState query={jobs} what="your jobs">
        {(list) =>
          list.length === 0 ? (
            <EmptyState title="No jobs yet" />
          ) : (
            <ul className="divide-y divide-sand-200" aria-label="All your jobs">
              {list.map((job) => {
                const shown = job.orders.filter((o) => o.status !== 'draft');
                return (
                  <li key={job.id} className="py-3">
                    <p className="font-semibold text-sand-900">{job.name}</p>
                    <p className="text-sm text-sand-700">{job.address}</p>
                    <ul className="mt-1">
                      {shown.map((o) => (
                        <li key={o.id}>
                          <Link className={rowLink} to={`/portal/orders/${o.id}`}>
                            Order {o.number}{' '}
                            <Badge tone="info">{orderStatusLabel(o.status, 'builder')}</Badge>
                          </Link>
                        </li>
                      ))}
                      {shown.length < job.orders.length ? (
                        <li className="px-1 py-2 text-sm text-sand-700">
                          An order is being prepared; its quote comes by e-mail.
                        </li>
                      ) : null}
                      <li>
                        <Link className={rowLink} to={`/jobs/${job.id}/files`}>
                          Plans of {job.name}
                        </Link>
                      </li>
                    </ul>
                  </li>
                );
              })}
            </ul>
          )
        }
      </QueryState>
    </Card>
  );
}
