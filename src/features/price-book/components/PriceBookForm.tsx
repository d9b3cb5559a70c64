import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { FormProvider, useForm, type FieldPath } from 'react-hook-form';
import type { PriceBook } from '../../../../shared/api/pricing';
import {
  Alert,
  Button,
  Card,
  ErrorMessage,
  Field,
  Input,
  Textarea,
  fieldDescriptionIds,
} from '../../../components/ui';
import { isApiError } from '../../../lib/api-client';
import { useSavePriceBook } from '../api/save-price-book';
import {
  formPathOfServerField,
  priceBookFormSchema,
  priceBookToFormValues,
  type PriceBookFormValues,
} from '../form/values';
import { NumberField } from './NumberField';
import { OverrideTable } from './OverrideTable';

/** Props of {@link PriceBookForm}. */
export interface PriceBookFormProps {
  book: PriceBook;
  /** The plant manager edits; the sales desk reads. */
  canEdit: boolean;
}

/** The price book's sections; one form, validated with the server's schema before it is sent. */
export function PriceBookForm({ book, canEdit }: PriceBookFormProps) {
  const save = useSavePriceBook();
  const [saved, setSaved] = useState(false);
  const [unplaced, setUnplaced] = useState(false);
  const form = useForm<PriceBookFormValues, unknown, PriceBook>({
    resolver: zodResolver(priceBookFormSchema),
    defaultValues: priceBookToFormValues(book),
  });
  const {
    register,
    handleSubmit,
    getValues,
    reset,
    setError,
    formState: { errors },
  } = form;
  const currency = book.currency;

  const onSubmit = handleSubmit((values) => {
    setSaved(false);
    setUnplaced(false);
    save.mutate(values, {
      onSuccess: (stored) => {
        reset(priceBookToFormValues(stored));
        setSaved(true);
      },
      onError: (error) => {
        if (!isApiError(error)) return;
        // Server messages go beside their fields; any the form cannot place stay in the alert.
        let missed = false;
        for (const [path, message] of Object.entries(error.fields)) {
          const field = formPathOfServerField(path, getValues());
          if (field) {
            setError(field as FieldPath<PriceBookFormValues>, { type: 'server', message });
          } else missed = true;
        }
        setUnplaced(missed);
      },
    });
  });

  const saveFailed =
    save.error &&
    (unplaced || !(isApiError(save.error) && Object.keys(save.error.fields).length > 0));
  const currencyError = errors.currency?.message;
  const termsError = errors.terms?.message;

  return (
    <FormProvider {...form}>
      <form onSubmit={onSubmit} noValidate>
        <fieldset disabled={!canEdit} className="grid min-w-0 gap-6 lg:grid-cols-2">
          <legend className="sr-only">Price book</legend>
          <Card title="Lumber">
            <div className="flex flex-col gap-4">
              <NumberField
                name="lumber.defaultPerBoardFoot"
                label="Default cost per board foot"
                unit={currency}
                hint="Used for any lumber without its own price below."
              />
              <OverrideTable
                name="lumber.byLumber"
                idLabel="Lumber"
                costLabel={`Per board foot (${currency})`}
                example="2x4 SPF No.2"
                addLabel="Add lumber price"
                canEdit={canEdit}
              />
            </div>
          </Card>
          <Card title="Plates">
            <div className="flex flex-col gap-4">
              <NumberField
                name="plates.defaultPerSquareInch"
                label="Default cost per square inch"
                unit={currency}
                hint="Prices any plate without its own price below by its area."
              />
              <OverrideTable
                name="plates.byPlate"
                idLabel="Plate"
                costLabel={`Per plate (${currency})`}
                example="4x6-20"
                addLabel="Add plate price"
                canEdit={canEdit}
              />
            </div>
          </Card>
          <Card title="Labour">
            <div className="grid gap-4 sm:grid-cols-2">
              <NumberField name="labour.perTruss" label="Minutes per truss" unit="min" />
              <NumberField name="labour.perPiece" label="Minutes per piece" unit="min" />
              <NumberField name="labour.perJoint" label="Minutes per joint" unit="min" />
              <NumberField
                name="labour.ratePerHour"
                label="Rate per hour"
                unit={`${currency} / h`}
              />
            </div>
          </Card>
          <Card title="Charges and quotes">
            <div className="grid gap-4 sm:grid-cols-2">
              <NumberField name="deliveryCharge" label="Delivery charge" unit={currency} />
              <NumberField
                name="margin"
                label="Margin"
                unit="%"
                hint="Share of the selling price."
              />
              <NumberField name="taxRate" label="Tax" unit="%" />
              <NumberField
                name="depositRate"
                label="Deposit"
                unit="%"
                hint="Asked of builders without an account."
              />
              <NumberField
                name="cancellationFee"
                label="Cancellation fee"
                unit={currency}
                hint="Kept from a card deposit when an order is cancelled before production."
              />
              <NumberField name="quoteValidityDays" label="Quotes valid for" unit="days" integer />
              <Field
                label="Currency"
                htmlFor="price-currency"
                hint="3-letter code, e.g. USD"
                error={currencyError}
              >
                <Input
                  id="price-currency"
                  maxLength={3}
                  autoComplete="off"
                  className="max-w-24 uppercase"
                  invalid={!!currencyError}
                  aria-describedby={fieldDescriptionIds('price-currency', currencyError, 'hint')}
                  {...register('currency')}
                />
              </Field>
            </div>
          </Card>
          <Card title="Terms" className="lg:col-span-2">
            <Field label="Terms printed on every quote" htmlFor="price-terms" error={termsError}>
              <Textarea
                id="price-terms"
                rows={5}
                invalid={!!termsError}
                aria-describedby={fieldDescriptionIds('price-terms', termsError)}
                {...register('terms')}
              />
            </Field>
          </Card>
        </fieldset>
        {canEdit ? (
          <div className="mt-6 flex flex-col gap-3">
            {saved ? (
              <Alert tone="success">
                Price book saved. New quotes use these prices; quotes already made keep theirs.
              </Alert>
            ) : null}
            {saveFailed ? (
              <ErrorMessage error={save.error} title="The price book was not saved" />
            ) : null}
            {Object.keys(errors).length > 0 && !saveFailed ? (
              <Alert tone="danger">Check the highlighted fields.</Alert>
            ) : null}
            <div>
              <Button type="submit" busy={save.isPending}>
                Save price book
              </Button>
            </div>
          </div>
        ) : null}
      </form>
    </FormProvider>
  );
}
