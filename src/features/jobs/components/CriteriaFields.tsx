import type { FieldErrors, UseFormRegister } from 'react-hook-form';
import type { AreaLoads } from '../../../../shared/api/jobs';
import { Field, Input, Textarea, fieldDescriptionIds } from '../../../components/ui';
import { areaLoadUnit, optionalNumberFromInput, type UnitSystem } from '../../../lib/units';
import type { JobFormValues } from './job-form-values';

/** Props of {@link CriteriaFields}. */
export interface CriteriaFieldsProps {
  register: UseFormRegister<JobFormValues>;
  errors: FieldErrors<JobFormValues>['criteria'];
  units: UnitSystem;
  /** The plant's default loads, shown as placeholders so an empty box reads "plant default". */
  defaults: AreaLoads | undefined;
}

const LOADS = [
  { key: 'tcll', label: 'TCLL', hint: 'Top chord live' },
  { key: 'tcdl', label: 'TCDL', hint: 'Top chord dead' },
  { key: 'bcll', label: 'BCLL', hint: 'Bottom chord live' },
  { key: 'bcdl', label: 'BCDL', hint: 'Bottom chord dead' },
] as const;

/** A job's design criteria: site snow and wind, notes, and load overrides of the plant defaults. */
export function CriteriaFields({ register, errors, units, defaults }: CriteriaFieldsProps) {
  const unit = areaLoadUnit(units);
  const number = (emptyAs: null | undefined) => ({
    setValueAs: (value: unknown) => optionalNumberFromInput(value, emptyAs),
  });
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-1 text-sm font-semibold text-sand-900">Design criteria</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field
          label={`Ground snow load (${unit})`}
          htmlFor="job-groundSnow"
          error={errors?.groundSnow?.message}
          hint="From the site's code; leave empty where there is none."
        >
          <Input
            id="job-groundSnow"
            inputMode="decimal"
            invalid={!!errors?.groundSnow}
            aria-describedby={fieldDescriptionIds(
              'job-groundSnow',
              errors?.groundSnow?.message,
              'hint',
            )}
            {...register('criteria.groundSnow', number(null))}
          />
        </Field>
        <Field
          label={`Wind uplift (${unit})`}
          htmlFor="job-windUplift"
          error={errors?.windUplift?.message}
        >
          <Input
            id="job-windUplift"
            inputMode="decimal"
            invalid={!!errors?.windUplift}
            aria-describedby={fieldDescriptionIds('job-windUplift', errors?.windUplift?.message)}
            {...register('criteria.windUplift', number(null))}
          />
        </Field>
      </div>
      <Field
        label="Exposure notes"
        htmlFor="job-exposureNotes"
        error={errors?.exposureNotes?.message}
      >
        <Textarea
          id="job-exposureNotes"
          rows={2}
          placeholder="e.g. open hillside, exposed to wind from the west"
          invalid={!!errors?.exposureNotes}
          {...register('criteria.exposureNotes')}
        />
      </Field>
      <div>
        <p className="text-sm font-medium text-sand-800">Design loads ({unit})</p>
        <p className="mb-2 text-xs text-sand-600">
          Empty boxes use the plant’s defaults, shown in grey. Loads must be confirmed by the
          building designer.
        </p>
        <div className="grid grid-cols-2 gap-4 sm:grid-cols-4">
          {LOADS.map((load) => {
            const id = `job-${load.key}`;
            const message = errors?.loads?.[load.key]?.message;
            return (
              <Field key={load.key} label={load.label} htmlFor={id} error={message}>
                <Input
                  id={id}
                  inputMode="decimal"
                  title={`${load.hint} load, ${unit}`}
                  placeholder={defaults ? String(defaults[load.key]) : undefined}
                  invalid={!!message}
                  aria-describedby={fieldDescriptionIds(id, message)}
                  {...register(`criteria.loads.${load.key}`, number(undefined))}
                />
              </Field>
            );
          })}
        </div>
      </div>
    </fieldset>
  );
}
