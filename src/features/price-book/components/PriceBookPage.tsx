import { Alert, PageHeader, QueryState } from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { usePriceBook } from '../api/get-price-book';
import { PriceBookForm } from './PriceBookForm';

/** Props of {@link PriceBookPage}. */
export interface PriceBookPageProps {
  canEdit: boolean;
}

/** `/price-book`: what quotes are priced from. The plant manager edits; the sales desk reads. */
export function PriceBookPage({ canEdit }: PriceBookPageProps) {
  const book = usePriceBook();
  return (
    <>
      <PageHeader
        title="Price book"
        description="Costs, labour, margin and terms that every new quote is priced from."
      />
      <QueryState query={book} what="the price book">
        {(b) => (
          <div className="flex flex-col gap-4">
            {b.demo ? (
              <Alert tone="warning" title="Invented demo values">
                {canEdit
                  ? 'These prices are invented defaults for trying Spanwise out, not real costs. Enter your plant’s prices and save to replace them.'
                  : 'These prices are invented defaults for trying Spanwise out, not real costs, until the plant manager enters the plant’s prices.'}
              </Alert>
            ) : null}
            {b.updatedAt ? (
              <p className="text-sm text-sand-600">
                Last saved {formatDateTime(b.updatedAt)}
                {b.updatedBy ? ` by ${b.updatedBy}` : ''}.
              </p>
            ) : null}
            {!canEdit ? (
              <Alert>You can read the price book; the plant manager changes it.</Alert>
            ) : null}
            {/* The form resets itself from the stored answer after a save. */}
            <PriceBookForm book={b} canEdit={canEdit} />
          </div>
        )}
      </QueryState>
    </>
  );
}
