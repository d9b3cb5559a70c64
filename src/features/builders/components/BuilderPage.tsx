import type { ReactNode } from 'react';
import type { CustomerDetail } from '../../../../shared/api/customers';
import { DetailList, EditInPlace, PageHeader, QueryState, TextLink } from '../../../components/ui';
import { formatDate } from '../../../lib/format';
import { useCustomer, useUpdateCustomer } from '../api/customer';
import { TermsBadge } from './builder-columns';
import { BuilderForm, builderFormValues } from './BuilderForm';

/** Props of {@link BuilderPage}. */
export interface BuilderPageProps {
  id: number;
  /** Sales and admin edit builders and add jobs. */
  canEdit: boolean;
  /** The builder's jobs panel (from the jobs feature; the router composes the two). */
  jobs: (customer: CustomerDetail) => ReactNode;
}

function Contacts({ customer }: { customer: CustomerDetail }) {
  if (customer.contacts.length === 0) {
    return <p className="text-sm text-sand-600">No contacts recorded.</p>;
  }
  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {customer.contacts.map((c, index) => (
        <li key={`${c.name}-${index}`} className="rounded border border-sand-200 p-3 text-sm">
          <p className="font-medium text-sand-900">{c.name}</p>
          {c.title ? <p className="text-sand-600">{c.title}</p> : null}
          {c.email ? (
            <a className="block text-timber-700 hover:underline" href={`mailto:${c.email}`}>
              {c.email}
            </a>
          ) : null}
          {c.phone ? <p className="text-sand-700 tabular-nums">{c.phone}</p> : null}
        </li>
      ))}
    </ul>
  );
}

function Details({ customer, canEdit }: { customer: CustomerDetail; canEdit: boolean }) {
  const update = useUpdateCustomer(customer.id);
  return (
    <EditInPlace
      title="Details"
      editTitle="Edit builder"
      editLabel="Edit details"
      canEdit={canEdit}
      savedMessage="The builder’s details were saved."
      form={({ saved, cancel }) => (
        <BuilderForm
          mode="edit"
          defaultValues={builderFormValues(customer)}
          busy={update.isPending}
          error={update.error}
          onCancel={() => {
            cancel();
            update.reset();
          }}
          onSubmit={(values) => update.mutate(values, { onSuccess: saved })}
        />
      )}
    >
      <div className="flex flex-col gap-6">
        <DetailList
          items={[
            { label: 'E-mail', value: customer.email },
            { label: 'Phone', value: customer.phone ?? '—' },
            { label: 'Terms', value: <TermsBadge terms={customer.terms} /> },
            { label: 'City', value: customer.city ?? '—' },
            { label: 'Billing address', value: customer.billingAddress ?? '—' },
            { label: 'Builder since', value: formatDate(customer.createdAt) },
          ]}
        />
        <div>
          <h3 className="mb-2 text-sm font-semibold text-sand-900">Contacts</h3>
          <Contacts customer={customer} />
        </div>
      </div>
    </EditInPlace>
  );
}

/** `/builders/:id`: a builder company's details and contacts (edit in place) and its jobs. */
export function BuilderPage({ id, canEdit, jobs }: BuilderPageProps) {
  const customer = useCustomer(id);
  return (
    <QueryState query={customer} what="the builder">
      {(c) => (
        <>
          <p className="mb-2 text-sm">
            <TextLink to="/builders">← Builders</TextLink>
          </p>
          <PageHeader
            title={c.name}
            description={`${c.jobCount} job${c.jobCount === 1 ? '' : 's'}${c.city ? ` · ${c.city}` : ''}`}
          />
          <div className="grid gap-6">
            <Details key={c.id} customer={c} canEdit={canEdit} />
            {jobs(c)}
          </div>
        </>
      )}
    </QueryState>
  );
}
