import { memo } from 'react';
import type { WebBraceKind } from '../../../../shared/api/design';
import { FieldGroup, SelectField, TextField, type FieldContext } from './FormFields';

const WEB_BRACE_LABELS: Record<WebBraceKind, string> = {
  either: 'Lateral brace or T-brace (name both)',
  lateral: 'Continuous lateral brace with diagonal bracing',
  tBrace: 'T-brace of the web’s size and grade',
};

function Check(props: { ctx: FieldContext; name: 'ceiling' | 'sheathing'; label: string }) {
  return (
    <label className="flex items-center gap-2 text-sm text-sand-800">
      <input
        type="checkbox"
        className="size-4 accent-timber-600"
        disabled={props.ctx.readOnly}
        {...props.ctx.register(props.name)}
      />
      {props.label}
    </label>
  );
}

/**
 * What holds the chords and webs out of plane: a ceiling or lateral bracing on the bottom chord
 * (which buckles sideways when uplift puts it in compression), sheathing or purlins on the top
 * chord, and how a web that needs restraint is braced.
 */
export const BracingFields = memo(function BracingFields(props: {
  ctx: FieldContext;
  units: 'imperial' | 'metric';
  ceiling: boolean;
  sheathing: boolean;
}) {
  const { ctx, units, ceiling, sheathing } = props;
  const hint = units === 'imperial' ? `on centre, e.g. 6'-0"` : 'on centre, millimetres';
  return (
    <FieldGroup title="Bracing">
      <div className="grid grid-cols-2 gap-3">
        <div className="flex flex-col gap-2">
          <Check ctx={ctx} name="sheathing" label="Top chord sheathed" />
          {sheathing ? null : (
            <TextField ctx={ctx} name="purlinSpacing" label="Purlin spacing" hint={hint} />
          )}
        </div>
        <div className="flex flex-col gap-2">
          <Check ctx={ctx} name="ceiling" label="Ceiling on bottom chord" />
          {ceiling ? null : (
            <TextField
              ctx={ctx}
              name="bottomChordBracing"
              label="Bottom chord bracing"
              hint={`${hint}; blank for 10 ft`}
              placeholder={units === 'imperial' ? `10'-0"` : '3048'}
            />
          )}
        </div>
      </div>
      <SelectField ctx={ctx} name="webBrace" label="Braced webs get">
        {(Object.keys(WEB_BRACE_LABELS) as WebBraceKind[]).map((k) => (
          <option key={k} value={k}>
            {WEB_BRACE_LABELS[k]}
          </option>
        ))}
      </SelectField>
    </FieldGroup>
  );
});
