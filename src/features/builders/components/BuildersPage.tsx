import { useState } from 'react';
import { TERMS } from '../../../../shared/api/terms';
import { useNavigate } from 'react-router';
import {
  Button,
  Dialog,
  EmptyState,
  FilterSelect,
  ListToolbar,
  PagedTable,
  PageHeader,
  SearchBox,
} from '../../../components/ui';
import { useListParams } from '../../../lib/use-list-params';
import { useCreateCustomer } from '../api/customer';
import { customerListParamsFromSearch, useCustomers } from '../api/list-customers';
import { BUILDER_SORT_COLUMNS, builderColumns } from './builder-columns';
import { BuilderForm, EMPTY_BUILDER, type BuilderFormOutput } from './BuilderForm';
import { DuplicateBuilder, duplicateOf } from './DuplicateBuilder';

/** `/builders`: the plant's builder companies; sort, filter, search and page through the URL. */
export function BuildersPage() {
  const { params, search, update } = useListParams();
  const query = customerListParamsFromSearch(search);
  const customers = useCustomers(query);
  const create = useCreateCustomer();
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  const [lastValues, setLastValues] = useState<BuilderFormOutput | null>(null);
  const submit = (values: BuilderFormOutput) => {
    setLastValues(values);
    create.mutate(values, {
      onSuccess: (customer) => void navigate(`/builders/${customer.id}`),
    });
  };

  const close = () => {
    setAdding(false);
    create.reset();
  };

  return (
    <>
      <PageHeader
        title="Builders"
        description="Builder companies the plant supplies, with their payment terms."
        actions={<Button onClick={() => setAdding(true)}>New builder</Button>}
      />
      <ListToolbar>
        <SearchBox
          label="Search builders"
          placeholder="Company, e-mail or city"
          value={params.q}
          onSearch={(q) => update({ q, page: 1 })}
        />
        <FilterSelect
          id="filter-terms"
          label="Account type"
          allLabel="All builders"
          value={query.terms ?? ''}
          onChange={(terms) => update({ filters: { terms } })}
        >
          <option value="account">{TERMS.account}</option>
          <option value="deposit">{TERMS.deposit}</option>
        </FilterSelect>
      </ListToolbar>
      <PagedTable
        query={customers}
        what="builder companies"
        caption="Builder companies"
        columns={builderColumns}
        rowKey={(c) => c.id}
        rowHref={(c) => `/builders/${c.id}`}
        sorting={{
          sort: query.sort,
          onSort: (sort) => update({ sort, page: 1 }),
          columns: BUILDER_SORT_COLUMNS,
        }}
        empty={
          <EmptyState
            title={
              params.q || query.terms ? 'No builders match this search' : 'No builder companies yet'
            }
          >
            {params.q || query.terms
              ? 'Try other words, or show all builders.'
              : 'Add the first builder company with “New builder”.'}
          </EmptyState>
        }
        onPage={(p) => update({ page: p })}
      />
      <Dialog open={adding} title="New builder" onClose={close} wide>
        <DuplicateBuilder
          error={create.error}
          busy={create.isPending}
          onCreateAnyway={() => lastValues && submit({ ...lastValues, confirmDuplicate: true })}
        />
        <BuilderForm
          mode="create"
          defaultValues={EMPTY_BUILDER}
          busy={create.isPending}
          error={duplicateOf(create.error) ? null : create.error}
          onCancel={close}
          onSubmit={submit}
        />
      </Dialog>
    </>
  );
}
