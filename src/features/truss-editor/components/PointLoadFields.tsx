import type { ReactNode } from 'react';
import { useFieldArray, type Control } from 'react-hook-form';
import { Button, Input, Select } from '../../../components/ui';
import { newPointLoadRow } from '../form/point-loads';
import type { TrussFormValues } from '../form/values';
import { FieldGroup, type FieldContext } from './FormFields';

const KIND_LABELS = { roofLive: 'Roof live', snow: 'Snow', floor: 'Floor' } as const;

/** A small caption over one input of a point-load row (the input names itself for readers). */
function Cell({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div className="flex min-w-0 flex-col gap-0.5">
      <span aria-hidden="true" className="text-xs text-sand-700">
        {label}
      </span>
      {children}
    </div>
  );
}

/**
 * The point-load table: one row per concentrated load (hung trusses on a girder, equipment),
 * with its position from the left heel, chord, dead and live load and the live load's kind.
 * Rows go into the design as they are typed, like every other field.
 */
export function PointLoadFields({
  ctx,
  control,
  units,
}: {
  ctx: FieldContext;
  control: Control<TrussFormValues>;
  units: 'imperial' | 'metric';
}) {
  const { fields, append, remove } = useFieldArray({ control, name: 'pointLoads' });
  const force = units === 'imperial' ? 'lb' : 'kN';
  const error = ctx.errors.pointLoads;
  return (
    <FieldGroup title="Point loads">
      {fields.length > 0 ? (
        <ol className="flex flex-col gap-2" data-testid="point-loads">
          {fields.map((f, i) => (
            <li key={f.id} className="rounded-md border border-sand-200 p-2">
              <div className="mb-1 flex items-center justify-between">
                <span className="text-xs font-semibold text-sand-800">Load {i + 1}</span>
                {ctx.readOnly ? null : (
                  <Button
                    type="button"
                    variant="ghost"
                    size="sm"
                    aria-label={`Remove point load ${i + 1}`}
                    onClick={() => remove(i)}
                  >
                    Remove
                  </Button>
                )}
              </div>
              <div className="grid grid-cols-2 gap-2">
                <Cell label="From left heel">
                  <Input
                    aria-label={`Point load ${i + 1} position`}
                    placeholder={units === 'imperial' ? `10'-0"` : '3000'}
                    autoComplete="off"
                    readOnly={ctx.readOnly}
                    invalid={!!error}
                    {...ctx.register(`pointLoads.${i}.x`)}
                  />
                </Cell>
                <Cell label="Chord">
                  <Select
                    aria-label={`Point load ${i + 1} chord`}
                    disabled={ctx.readOnly}
                    {...ctx.register(`pointLoads.${i}.chord`)}
                  >
                    <option value="top">Top</option>
                    <option value="bottom">Bottom</option>
                  </Select>
                </Cell>
              </div>
              <div className="mt-2 grid grid-cols-[1fr_1fr_1.4fr] gap-2">
                <Cell label={`Dead (${force})`}>
                  <Input
                    aria-label={`Point load ${i + 1} dead load`}
                    inputMode="decimal"
                    autoComplete="off"
                    readOnly={ctx.readOnly}
                    {...ctx.register(`pointLoads.${i}.dead`)}
                  />
                </Cell>
                <Cell label={`Live (${force})`}>
                  <Input
                    aria-label={`Point load ${i + 1} live load`}
                    inputMode="decimal"
                    autoComplete="off"
                    readOnly={ctx.readOnly}
                    {...ctx.register(`pointLoads.${i}.live`)}
                  />
                </Cell>
                <Cell label="Live kind">
                  <Select
                    aria-label={`Point load ${i + 1} kind`}
                    disabled={ctx.readOnly}
                    {...ctx.register(`pointLoads.${i}.kind`)}
                  >
                    {Object.entries(KIND_LABELS).map(([k, label]) => (
                      <option key={k} value={k}>
                        {label}
                      </option>
                    ))}
                  </Select>
                </Cell>
              </div>
            </li>
          ))}
        </ol>
      ) : (
        <p className="text-sm text-sand-600">
          None. Add the loads of trusses hung on this one (a girder) or equipment.
        </p>
      )}
      {error ? (
        <p role="alert" className="text-sm text-danger-700">
          {error}
        </p>
      ) : null}
      {ctx.readOnly ? null : (
        <div>
          <Button
            type="button"
            variant="secondary"
            size="sm"
            onClick={() => append(newPointLoadRow())}
          >
            Add point load
          </Button>
        </div>
      )}
    </FieldGroup>
  );
}
