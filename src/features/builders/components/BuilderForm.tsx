import { zodResolver } from '@hookform/resolvers/zod';
import { TERMS } from '../../../../shared/api/terms';
import { useEffect } from 'react';
import { useForm, type Path } from 'react-hook-form';
import type { z } from 'zod';
import {
  createCustomerSchema,
  updateCustomerSchema,
  type CustomerDetail,
} from '../../../../shared/api/customers';
import {
  Button,
  ErrorMessage,
  Field,
  Input,
  Select,
  Textarea,
  fieldDescriptionIds,
} from '../../../components/ui';
import { serverFieldErrors } from '../../../lib/form-errors';
import { ContactRows } from './ContactRows';

/** What the builder form edits (the create schema's input: every field present). */
export type BuilderFormValues = z.input<typeof createCustomerSchema>;
export type BuilderFormOutput = z.output<typeof createCustomerSchema>;

const FIELD_NAMES = Object.keys(createCustomerSchema.shape);

/** Blank values of "New builder" (deposit first: new builders rarely have an account yet). */
export const EMPTY_BUILDER: BuilderFormValues = {
  name: '',
  email: '',
  phone: '',
  terms: 'deposit',
  billingAddress: '',
  city: '',
  contacts: [],
};

/** A stored builder as form values (nulls become empty inputs). */
export function builderFormValues(customer: CustomerDetail): BuilderFormValues {
  return {
    name: customer.name,
    email: customer.email,
    phone: customer.phone ?? '',
    terms: customer.terms,
    billingAddress: customer.billingAddress ?? '',
    city: customer.city ?? '',
    contacts: customer.contacts.map((c) => ({
      name: c.name,
      title: c.title ?? '',
      email: c.email ?? '',
      phone: c.phone ?? '',
    })),
  };
}

/** Props of {@link BuilderForm}. */
export interface BuilderFormProps {
  /** `create` validates with `createCustomerSchema`, `edit` with `updateCustomerSchema`. */
  mode: 'create' | 'edit';
  defaultValues: BuilderFormValues;
  onSubmit: (values: BuilderFormOutput) => void;
  onCancel: () => void;
  busy: boolean;
  /** The failed save, if any: its `fields` go beside the inputs, its message in an alert. */
  error: unknown;
}

/** A builder company's details and contacts, validated with the same schema as the server. */
export function BuilderForm({
  mode,
  defaultValues,
  onSubmit,
  onCancel,
  busy,
  error,
}: BuilderFormProps) {
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<BuilderFormValues, unknown, BuilderFormOutput>({
    // Edit sends the same full set of fields; the update schema differs only in being partial.
    resolver: zodResolver(mode === 'create' ? createCustomerSchema : updateCustomerSchema) as never,
    defaultValues,
  });

  useEffect(() => {
    for (const [path, message] of serverFieldErrors(error, FIELD_NAMES)) {
      setError(path as Path<BuilderFormValues>, { type: 'server', message });
    }
  }, [error, setError]);

  const text = (
    name: 'name' | 'email' | 'phone' | 'city',
    label: string,
    props: { type?: string; autoComplete?: string } = {},
  ) => {
    const id = `builder-${name}`;
    const message = errors[name]?.message;
    return (
      <Field label={label} htmlFor={id} error={message}>
        <Input
          id={id}
          invalid={!!message}
          aria-describedby={fieldDescriptionIds(id, message)}
          {...props}
          {...register(name)}
        />
      </Field>
    );
  };

  return (
    <form onSubmit={handleSubmit(onSubmit)} noValidate className="flex flex-col gap-4">
      {error ? (
        <ErrorMessage
          error={error}
          title={mode === 'create' ? 'The builder was not added' : 'The change was not saved'}
        />
      ) : null}
      {errors.root?.message ? <ErrorMessage error={new Error(errors.root.message)} /> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <div className="sm:col-span-2">
          {text('name', 'Company name', { autoComplete: 'organization' })}
        </div>
        {text('email', 'E-mail', { type: 'email', autoComplete: 'email' })}
        {text('phone', 'Phone', { type: 'tel', autoComplete: 'tel' })}
        <Field label="Terms" htmlFor="builder-terms" error={errors.terms?.message}>
          <Select id="builder-terms" invalid={!!errors.terms} {...register('terms')}>
            <option value="account">{TERMS.account}</option>
            <option value="deposit">{TERMS.deposit}</option>
          </Select>
        </Field>
        {text('city', 'City')}
        <div className="sm:col-span-2">
          <Field
            label="Billing address"
            htmlFor="builder-billingAddress"
            error={errors.billingAddress?.message}
          >
            <Textarea
              id="builder-billingAddress"
              rows={2}
              invalid={!!errors.billingAddress}
              {...register('billingAddress')}
            />
          </Field>
        </div>
      </div>
      <ContactRows control={control} register={register} errors={errors.contacts} />
      <div className="flex justify-end gap-2 pt-1">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" busy={busy}>
          Save builder
        </Button>
      </div>
    </form>
  );
}
