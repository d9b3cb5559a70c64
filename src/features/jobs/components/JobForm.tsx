import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect } from 'react';
import { useForm, type Path } from 'react-hook-form';
import { createJobSchema, updateJobSchema, type CreateJobInput } from '../../../../shared/api/jobs';
import { Button, ErrorMessage, Field, Input, fieldDescriptionIds } from '../../../components/ui';
import { serverFieldErrors } from '../../../lib/form-errors';
import { usePlant } from '../api/job';
import { CriteriaFields } from './CriteriaFields';
import type { JobFormValues } from './job-form-values';

const FIELD_NAMES = Object.keys(createJobSchema.shape);

/** Empty optional text is "none" (null), so a cleared plan revision is stored as cleared. */
function withNulls(values: CreateJobInput): CreateJobInput {
  return {
    ...values,
    planRevision: values.planRevision || null,
    criteria: { ...values.criteria, exposureNotes: values.criteria.exposureNotes || null },
  };
}

/** Props of {@link JobForm}. */
export interface JobFormProps {
  /** `create` validates with `createJobSchema`, `edit` with `updateJobSchema`. */
  mode: 'create' | 'edit';
  defaultValues: JobFormValues;
  onSubmit: (values: CreateJobInput) => void;
  onCancel: () => void;
  busy: boolean;
  /** The failed save, if any: its `fields` go beside the inputs, its message in an alert. */
  error: unknown;
}

/** A job's site, plan revision and design criteria, checked with the server's schema. */
export function JobForm({ mode, defaultValues, onSubmit, onCancel, busy, error }: JobFormProps) {
  const plant = usePlant();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<JobFormValues, unknown, CreateJobInput>({
    // Edit sends every field; the update schema differs only in being partial.
    resolver: zodResolver(mode === 'create' ? createJobSchema : updateJobSchema) as never,
    defaultValues,
  });

  useEffect(() => {
    for (const [path, message] of serverFieldErrors(error, FIELD_NAMES)) {
      setError(path as Path<JobFormValues>, { type: 'server', message });
    }
  }, [error, setError]);

  const text = (name: 'name' | 'address' | 'planRevision', label: string, hint?: string) => {
    const id = `job-${name}`;
    const message = errors[name]?.message;
    return (
      <Field label={label} htmlFor={id} error={message} hint={hint}>
        <Input
          id={id}
          autoComplete="off"
          invalid={!!message}
          aria-describedby={fieldDescriptionIds(id, message, hint)}
          {...register(name)}
        />
      </Field>
    );
  };

  return (
    <form
      onSubmit={handleSubmit((values) => onSubmit(withNulls(values)))}
      noValidate
      className="flex flex-col gap-5"
    >
      {error ? (
        <ErrorMessage
          error={error}
          title={mode === 'create' ? 'The job was not added' : 'The change was not saved'}
        />
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        {text('name', 'Job name')}
        {text('planRevision', 'Plan revision', 'As printed on the builder’s plans, e.g. “Rev C”.')}
        <div className="sm:col-span-2">{text('address', 'Site address')}</div>
      </div>
      {plant.error ? (
        <ErrorMessage error={plant.error} title="Could not load the plant’s default loads" />
      ) : null}
      <CriteriaFields
        register={register}
        errors={errors.criteria}
        units={plant.data?.units ?? 'imperial'}
        defaults={plant.data?.defaultLoads}
      />
      <div className="flex justify-end gap-2 pt-1">
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
        <Button type="submit" busy={busy}>
          Save job
        </Button>
      </div>
    </form>
  );
}
