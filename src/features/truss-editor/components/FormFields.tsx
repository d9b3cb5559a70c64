import type { ReactNode } from 'react';
import type { UseFormRegister } from 'react-hook-form';
import { Field, fieldDescriptionIds, Input, Select } from '../../../components/ui';
import type { TrussFormErrors, TrussFormField, TrussFormValues } from '../form/values';

/** What every field of the truss form needs. */
export interface FieldContext {
  register: UseFormRegister<TrussFormValues>;
  errors: TrussFormErrors;
  readOnly: boolean;
}

const id = (name: TrussFormField) => `truss-${name}`;

/** A labelled text field bound to the form; its message shows beside it. */
export function TextField(props: {
  ctx: FieldContext;
  name: TrussFormField;
  label: string;
  hint?: string;
  placeholder?: string;
  inputMode?: 'decimal' | 'numeric' | 'text';
}) {
  const { ctx, name, label, hint, placeholder, inputMode = 'text' } = props;
  const error = ctx.errors[name];
  return (
    <Field label={label} htmlFor={id(name)} error={error} hint={hint}>
      <Input
        id={id(name)}
        invalid={!!error}
        aria-describedby={fieldDescriptionIds(id(name), error, hint)}
        placeholder={placeholder}
        inputMode={inputMode}
        autoComplete="off"
        spellCheck={false}
        readOnly={ctx.readOnly}
        {...ctx.register(name)}
      />
    </Field>
  );
}

/** A labelled select bound to the form. */
export function SelectField(props: {
  ctx: FieldContext;
  name: TrussFormField;
  label: string;
  hint?: string;
  children: ReactNode;
}) {
  const { ctx, name, label, hint, children } = props;
  const error = ctx.errors[name];
  return (
    <Field label={label} htmlFor={id(name)} error={error} hint={hint}>
      <Select
        id={id(name)}
        invalid={!!error}
        aria-describedby={fieldDescriptionIds(id(name), error, hint)}
        disabled={ctx.readOnly}
        {...ctx.register(name)}
      >
        {children}
      </Select>
    </Field>
  );
}

/** A titled group of fields. */
export function FieldGroup({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-3 border-t border-sand-200 pt-4 first:border-t-0 first:pt-0">
      <legend className="mb-1 text-sm font-semibold tracking-wide text-sand-800 uppercase">
        {title}
      </legend>
      {children}
    </fieldset>
  );
}
