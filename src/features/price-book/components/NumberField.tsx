import { get, useFormContext, type FieldPath } from 'react-hook-form';
import { Field, Input, fieldDescriptionIds } from '../../../components/ui';
import type { PriceBookFormValues } from '../form/values';

/** Props of {@link NumberField}. */
export interface NumberFieldProps {
  name: FieldPath<PriceBookFormValues>;
  label: string;
  /** Unit shown after the input ("%", "min", "USD"). */
  unit?: string;
  hint?: string;
  /** Whole numbers only (days). */
  integer?: boolean;
}

/** A labelled number input of the price book form, with its unit and its error beside it. */
export function NumberField({ name, label, unit, hint, integer }: NumberFieldProps) {
  const {
    register,
    formState: { errors },
  } = useFormContext<PriceBookFormValues>();
  const id = `price-${name.replaceAll('.', '-')}`;
  const message = (get(errors, name) as { message?: string } | undefined)?.message;
  return (
    <Field label={label} htmlFor={id} error={message} hint={hint}>
      <div className="flex items-center gap-2">
        <Input
          id={id}
          type="number"
          inputMode="decimal"
          step={integer ? 1 : 'any'}
          min={0}
          className="max-w-40 text-right tabular-nums"
          invalid={!!message}
          aria-describedby={fieldDescriptionIds(id, message, hint)}
          {...register(name, { valueAsNumber: true })}
        />
        {unit ? <span className="text-sm text-sand-600">{unit}</span> : null}
      </div>
    </Field>
  );
}
