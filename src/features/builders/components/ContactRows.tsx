import {
  useFieldArray,
  type Control,
  type FieldErrors,
  type UseFormRegister,
} from 'react-hook-form';
import { Button, Field, Input, fieldDescriptionIds } from '../../../components/ui';
import type { BuilderFormValues } from './BuilderForm';

/** Props of {@link ContactRows}. */
export interface ContactRowsProps {
  control: Control<BuilderFormValues, unknown, unknown>;
  register: UseFormRegister<BuilderFormValues>;
  errors: FieldErrors<BuilderFormValues>['contacts'];
}

type ContactField = 'name' | 'title' | 'email' | 'phone';
// Labels say "email", not the company field's "E-mail", so the company's field stays uniquely named.
const CONTACT_FIELDS: { name: ContactField; label: string; type?: string }[] = [
  { name: 'name', label: 'name' },
  { name: 'title', label: 'title' },
  { name: 'email', label: 'email', type: 'email' },
  { name: 'phone', label: 'phone', type: 'tel' },
];

/** The builder's people: one row per contact, added and removed in place. */
export function ContactRows({ control, register, errors }: ContactRowsProps) {
  const { fields, append, remove } = useFieldArray({ control, name: 'contacts' });
  return (
    <fieldset className="flex flex-col gap-3">
      <legend className="mb-1 text-sm font-semibold text-sand-900">Contacts</legend>
      {fields.length === 0 ? (
        <p className="text-sm text-sand-600">No contacts yet. Add the people you deal with.</p>
      ) : null}
      {typeof errors?.message === 'string' ? (
        <p className="text-sm text-danger-700">{errors.message}</p>
      ) : null}
      {fields.map((row, index) => (
        <div
          key={row.id}
          className="grid gap-3 rounded border border-sand-200 bg-sand-50 p-3 sm:grid-cols-2"
        >
          {CONTACT_FIELDS.map((f) => {
            const id = `contact-${index}-${f.name}`;
            const message = errors?.[index]?.[f.name]?.message;
            return (
              <Field
                key={f.name}
                label={`Contact ${index + 1} ${f.label}`}
                htmlFor={id}
                error={message}
              >
                <Input
                  id={id}
                  type={f.type}
                  invalid={!!message}
                  aria-describedby={fieldDescriptionIds(id, message)}
                  {...register(`contacts.${index}.${f.name}`)}
                />
              </Field>
            );
          })}
          <div className="sm:col-span-2">
            <Button size="sm" variant="ghost" onClick={() => remove(index)}>
              Remove contact {index + 1}
            </Button>
          </div>
        </div>
      ))}
      <div>
        <Button
          size="sm"
          variant="secondary"
          onClick={() => append({ name: '', title: '', email: '', phone: '' })}
        >
          Add contact
        </Button>
      </div>
    </fieldset>
  );
}
