import { get, useFieldArray, useFormContext } from 'react-hook-form';
import { Button, EmptyState, Input } from '../../../components/ui';
import type { PriceBookFormValues } from '../form/values';

/** Props of {@link OverrideTable}. */
export interface OverrideTableProps {
  name: 'lumber.byLumber' | 'plates.byPlate';
  /** Heading of the id column ("Lumber", "Plate"). */
  idLabel: string;
  /** Heading of the cost column, with its unit ("Cost per board foot (USD)"). */
  costLabel: string;
  /** An example id for the empty input ("2x4 SPF No.2"). */
  example: string;
  /** Label of the add button ("Add lumber price"). */
  addLabel: string;
  canEdit: boolean;
}

const errorOf = (errors: unknown, path: string) =>
  (get(errors, path) as { message?: string } | undefined)?.message;

/** Per-item prices that replace the default: an editable table of id + cost rows. */
export function OverrideTable({
  name,
  idLabel,
  costLabel,
  example,
  addLabel,
  canEdit,
}: OverrideTableProps) {
  const {
    control,
    register,
    formState: { errors },
  } = useFormContext<PriceBookFormValues>();
  const { fields, append, remove } = useFieldArray({ control, name });
  const base = `price-${name.replace('.', '-')}`;

  return (
    <div className="flex flex-col gap-2">
      {fields.length === 0 ? (
        <EmptyState title="No item prices">
          {canEdit ? 'Every item uses the default price until you add one here.' : null}
        </EmptyState>
      ) : (
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">{`${idLabel} prices`}</caption>
          <thead className="bg-sand-100 text-xs font-semibold tracking-wide text-sand-700 uppercase">
            <tr>
              <th scope="col" className="px-3 py-2">
                {idLabel}
              </th>
              <th scope="col" className="px-3 py-2 text-right">
                {costLabel}
              </th>
              {canEdit ? (
                <th scope="col" className="px-3 py-2">
                  <span className="sr-only">Actions</span>
                </th>
              ) : null}
            </tr>
          </thead>
          <tbody className="divide-y divide-sand-200">
            {fields.map((field, index) => {
              const idError = errorOf(errors, `${name}.${index}.id`);
              const costError = errorOf(errors, `${name}.${index}.cost`);
              return (
                <tr key={field.id} className="align-top">
                  <td className="px-3 py-2">
                    <Input
                      aria-label={`${idLabel} ${index + 1}`}
                      placeholder={example}
                      invalid={!!idError}
                      aria-describedby={idError ? `${base}-${index}-id-error` : undefined}
                      {...register(`${name}.${index}.id`)}
                    />
                    {idError ? (
                      <p id={`${base}-${index}-id-error`} className="mt-1 text-sm text-danger-700">
                        {idError}
                      </p>
                    ) : null}
                  </td>
                  <td className="w-36 px-3 py-2">
                    <Input
                      type="number"
                      inputMode="decimal"
                      step="any"
                      min={0}
                      aria-label={`${costLabel}, row ${index + 1}`}
                      className="text-right tabular-nums"
                      invalid={!!costError}
                      aria-describedby={costError ? `${base}-${index}-cost-error` : undefined}
                      {...register(`${name}.${index}.cost`, { valueAsNumber: true })}
                    />
                    {costError ? (
                      <p
                        id={`${base}-${index}-cost-error`}
                        className="mt-1 text-sm text-danger-700"
                      >
                        {costError}
                      </p>
                    ) : null}
                  </td>
                  {canEdit ? (
                    <td className="w-px px-3 py-2">
                      <Button
                        variant="ghost"
                        size="sm"
                        className="mt-1"
                        aria-label={`Remove ${idLabel.toLowerCase()} row ${index + 1}`}
                        onClick={() => remove(index)}
                      >
                        Remove
                      </Button>
                    </td>
                  ) : null}
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      {canEdit ? (
        <div>
          {/* NaN leaves the cost empty, so a forgotten cost is flagged rather than saved as 0. */}
          <Button
            variant="secondary"
            size="sm"
            onClick={() => append({ id: '', cost: Number.NaN })}
          >
            {addLabel}
          </Button>
        </div>
      ) : null}
    </div>
  );
}
