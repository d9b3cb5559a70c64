import { useFieldArray, type Control } from 'react-hook-form';
import { Button, Input, Select } from '../../../components/ui';
import { newPointLoadRow } from '../form/point-loads';
import type { TrussFormValues } from '../form/values';
import { FieldGroup, type FieldContext } from './FormFields';

const KIND_LABELS = { roofLive: 'Roof live', snow: 'Snow', floor: 'Floor/attic' } as const;

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
        <table className="w-full text-sm" data-testid="point-loads">
          <thead>
            <tr className="text-left text-xs text-sand-700">
              <th className="pb-1 font-medium">From left heel</th>
              <th className="pb-1 font-medium">Chord</th>
              <th className="pb-1 font-medium">Dead ({force})</th>
              <th className="pb-1 font-medium">Live ({force})</th>
              <th className="pb-1 font-medium">Kind</th>
              <th className="pb-1">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => (
              <tr key={f.id}>
                <td className="pr-1 pb-1">
                  <Input
                    aria-label={`Point load ${i + 1} position`}
                    placeholder={units === 'imperial' ? `10'-0"` : '3000'}
                    autoComplete="off"
                    readOnly={ctx.readOnly}
                    invalid={!!error}
                    {...ctx.register(`pointLoads.${i}.x`)}
                  />
                </td>
                <td className="pr-1 pb-1">
                  <Select
                    aria-label={`Point load ${i + 1} chord`}
                    disabled={ctx.readOnly}
                    {...ctx.register(`pointLoads.${i}.chord`)}
                  >
                    <option value="top">Top</option>
                    <option value="bottom">Bottom</option>
                  </Select>
                </td>
                <td className="pr-1 pb-1">
                  <Input
                    aria-label={`Point load ${i + 1} dead load`}
                    inputMode="decimal"
                    autoComplete="off"
                    readOnly={ctx.readOnly}
                    {...ctx.register(`pointLoads.${i}.dead`)}
                  />
                </td>
                <td className="pr-1 pb-1">
                  <Input
                    aria-label={`Point load ${i + 1} live load`}
                    inputMode="decimal"
                    autoComplete="off"
                    readOnly={ctx.readOnly}
                    {...ctx.register(`pointLoads.${i}.live`)}
                  />
                </td>
                <td className="pr-1 pb-1">
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
                </td>
                <td className="pb-1">
                  {ctx.readOnly ? null : (
                    <Button
                      type="button"
                      variant="secondary"
                      size="sm"
                      aria-label={`Remove point load ${i + 1}`}
                      onClick={() => remove(i)}
                    >
                      ✕
                    </Button>
                  )}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
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
