import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import { ROLE_LABELS, ROLES } from '../../../../shared/api/roles';
import { createUserSchema, type User } from '../../../../shared/api/users';
import {
  Button,
  ErrorMessage,
  Field,
  Input,
  Select,
  fieldDescriptionIds,
} from '../../../components/ui';
import { isApiError } from '../../../lib/api-client';
import { useBuilderOptions } from '../api/builder-options';
import { useCreateUser } from '../api/create-user';

/** Props of {@link AddUserForm}. */
export interface AddUserFormProps {
  onDone: (user: User) => void;
  onCancel: () => void;
}

/** "Add user": validated in the browser with the same schema the server uses. */
export function AddUserForm({ onDone, onCancel }: AddUserFormProps) {
  const create = useCreateUser();
  const {
    register,
    handleSubmit,
    control,
    setError,
    formState: { errors },
  } = useForm({
    resolver: zodResolver(createUserSchema),
    defaultValues: { email: '', name: '', role: 'sales', password: '', customerId: null },
  });
  const role = useWatch({ control, name: 'role' });
  const builders = useBuilderOptions(role === 'builder');

  const onSubmit = handleSubmit((values) => {
    const body = { ...values, customerId: values.role === 'builder' ? values.customerId : null };
    create.mutate(body, {
      onSuccess: onDone,
      onError: (error) => {
        // Put the server's per-field messages (e.g. e-mail taken) beside the fields.
        if (!isApiError(error)) return;
        for (const [name, message] of Object.entries(error.fields)) {
          if (name in createUserSchema.shape) {
            setError(name as keyof typeof values, { type: 'server', message });
          }
        }
      },
    });
  });

  const describe = (id: string, error?: string) => fieldDescriptionIds(id, error);

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      {create.error && !(isApiError(create.error) && Object.keys(create.error.fields).length) ? (
        <ErrorMessage error={create.error} title="The user was not added" />
      ) : null}
      <Field label="Name" htmlFor="user-name" error={errors.name?.message}>
        <Input
          id="user-name"
          autoComplete="off"
          invalid={!!errors.name}
          aria-describedby={describe('user-name', errors.name?.message)}
          {...register('name')}
        />
      </Field>
      <Field label="E-mail" htmlFor="user-email" error={errors.email?.message}>
        <Input
          id="user-email"
          type="email"
          autoComplete="off"
          invalid={!!errors.email}
          aria-describedby={describe('user-email', errors.email?.message)}
          {...register('email')}
        />
      </Field>
      <Field label="Role" htmlFor="user-role" error={errors.role?.message}>
        <Select id="user-role" invalid={!!errors.role} {...register('role')}>
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </Select>
      </Field>
      {role === 'builder' ? (
        <Field
          label="Builder company"
          htmlFor="user-customer"
          error={
            errors.customerId?.message ??
            (builders.error ? 'Could not load builder companies.' : undefined)
          }
        >
          <Select
            id="user-customer"
            invalid={!!errors.customerId}
            disabled={builders.isPending}
            aria-describedby={describe('user-customer', errors.customerId?.message)}
            {...register('customerId', {
              setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)),
            })}
          >
            <option value="">
              {builders.isPending ? 'Loading companies…' : 'Choose a company'}
            </option>
            {builders.data?.items.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      <Field
        label="Starting password"
        htmlFor="user-password"
        hint="At least 10 characters. Share it with the person privately."
        error={errors.password?.message}
      >
        <Input
          id="user-password"
          type="password"
          autoComplete="new-password"
          invalid={!!errors.password}
          aria-describedby={fieldDescriptionIds('user-password', errors.password?.message, 'hint')}
          {...register('password')}
        />
      </Field>
      <div className="flex justify-end gap-2 pt-1">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" busy={create.isPending}>
          Add user
        </Button>
      </div>
    </form>
  );
}
