import { memo } from 'react';
import { LUMBER_GRADES, LUMBER_SIZES } from '../../../../shared/api/design';
import type { ProfileKind } from '../../../../shared/engine/profiles/types';
import { FieldGroup, SelectField, TextField, type FieldContext } from './FormFields';

/** Hints in the plant's units, so the user sees what a bare number means. */
const hints = (units: 'imperial' | 'metric') =>
  units === 'imperial'
    ? {
        long: `e.g. 28'-6 1/2", 28-6 or 342 1/2 (inches)`,
        short: 'inches, e.g. 3 1/2',
        load: 'psf',
      }
    : { long: 'millimetres, e.g. 8687', short: 'millimetres', load: 'kPa' };

/** Mark, quantity and plies of the line. */
export const LineFields = memo(function LineFields({ ctx }: { ctx: FieldContext }) {
  return (
    <FieldGroup title="Line">
      <div className="grid grid-cols-3 gap-3">
        <TextField ctx={ctx} name="mark" label="Mark" hint="e.g. T1 or G2-A" />
        <TextField ctx={ctx} name="quantity" label="Quantity" inputMode="numeric" />
        <TextField ctx={ctx} name="plies" label="Plies" inputMode="numeric" />
      </div>
    </FieldGroup>
  );
});

/** Span, pitch, heel, overhangs, spacing and the kind-specific geometry. */
export const GeometryFields = memo(function GeometryFields(props: {
  ctx: FieldContext;
  units: 'imperial' | 'metric';
  kind: ProfileKind;
}) {
  const { ctx, units, kind } = props;
  const h = hints(units);
  return (
    <FieldGroup title="Geometry">
      <div className="grid grid-cols-2 gap-3">
        <TextField ctx={ctx} name="span" label="Span" hint={h.long} />
        {kind === 'flat' ? (
          <TextField ctx={ctx} name="depth" label="Depth" hint={h.long} />
        ) : (
          <TextField ctx={ctx} name="pitch" label="Pitch" hint="rise per 12, e.g. 6/12" />
        )}
        {kind === 'scissor' ? (
          <TextField
            ctx={ctx}
            name="bottomPitch"
            label="Bottom chord slope"
            hint="rise per 12, below the pitch"
          />
        ) : null}
        {kind === 'flat' ? (
          <TextField
            ctx={ctx}
            name="panels"
            label="Panels"
            hint="even, 2 to 24"
            inputMode="numeric"
          />
        ) : null}
        <TextField ctx={ctx} name="heelHeight" label="Heel height" hint={h.short} />
        <TextField ctx={ctx} name="spacing" label="Spacing" hint={`on centre, ${h.short}`} />
        <TextField ctx={ctx} name="overhangLeft" label="Left overhang" hint={h.short} />
        <TextField ctx={ctx} name="overhangRight" label="Right overhang" hint={h.short} />
      </div>
    </FieldGroup>
  );
});

/** Area loads, snow and wind uplift, in psf or kPa. */
export const LoadFields = memo(function LoadFields(props: {
  ctx: FieldContext;
  units: 'imperial' | 'metric';
}) {
  const { ctx, units } = props;
  const u = hints(units).load;
  return (
    <FieldGroup title="Loads">
      <div className="grid grid-cols-2 gap-3">
        <TextField ctx={ctx} name="tcll" label={`TCLL (${u})`} inputMode="decimal" />
        <TextField ctx={ctx} name="tcdl" label={`TCDL (${u})`} inputMode="decimal" />
        <TextField ctx={ctx} name="bcll" label={`BCLL (${u})`} inputMode="decimal" />
        <TextField ctx={ctx} name="bcdl" label={`BCDL (${u})`} inputMode="decimal" />
        <TextField
          ctx={ctx}
          name="bcllNonConcurrent"
          label={`Non-concurrent BCLL (${u})`}
          hint="blank for none"
          inputMode="decimal"
        />
        <TextField
          ctx={ctx}
          name="windUplift"
          label={`Wind uplift (${u})`}
          hint="blank for none"
          inputMode="decimal"
        />
        <TextField
          ctx={ctx}
          name="snowPg"
          label={`Ground snow (${u})`}
          hint="blank or 0 for no snow"
          inputMode="decimal"
        />
        <label className="flex items-center gap-2 self-center text-sm text-sand-800">
          <input
            type="checkbox"
            className="size-4 accent-timber-600"
            disabled={ctx.readOnly}
            {...ctx.register('snowSlippery')}
          />
          Slippery roof
        </label>
        <div className="col-span-2 grid grid-cols-3 gap-3">
          <TextField ctx={ctx} name="snowCe" label="Ce" hint="default 1.0" inputMode="decimal" />
          <TextField ctx={ctx} name="snowCt" label="Ct" hint="default 1.0" inputMode="decimal" />
          <TextField ctx={ctx} name="snowIs" label="Is" hint="default 1.0" inputMode="decimal" />
        </div>
      </div>
    </FieldGroup>
  );
});

function LumberOptions() {
  return (
    <>
      <option value="">Auto (cheapest that passes)</option>
      {LUMBER_SIZES.map((size) => (
        <optgroup key={size} label={size}>
          {LUMBER_GRADES.map((grade) => (
            <option key={grade} value={`${size} ${grade}`}>
              {size} {grade}
            </option>
          ))}
        </optgroup>
      ))}
    </>
  );
}

/** Lumber per role, braced webs, bearing width and deflection limits. */
export const LumberFields = memo(function LumberFields(props: {
  ctx: FieldContext;
  units: 'imperial' | 'metric';
}) {
  const { ctx, units } = props;
  return (
    <FieldGroup title="Lumber, bracing and limits">
      <div className="grid grid-cols-1 gap-3">
        <SelectField ctx={ctx} name="lumberTop" label="Top chord lumber">
          <LumberOptions />
        </SelectField>
        <SelectField ctx={ctx} name="lumberBottom" label="Bottom chord lumber">
          <LumberOptions />
        </SelectField>
        <SelectField ctx={ctx} name="lumberWebs" label="Web lumber">
          <LumberOptions />
        </SelectField>
      </div>
      <div className="grid grid-cols-2 gap-3">
        <TextField
          ctx={ctx}
          name="webBraces"
          label="Braced webs"
          hint="member ids, e.g. BF, CF"
          placeholder="none"
        />
        <TextField ctx={ctx} name="bearingWidth" label="Bearing width" hint={hints(units).short} />
        <TextField
          ctx={ctx}
          name="deflectionLive"
          label="Live deflection limit (L/…)"
          inputMode="numeric"
        />
        <TextField
          ctx={ctx}
          name="deflectionTotal"
          label="Total deflection limit (L/…)"
          inputMode="numeric"
        />
      </div>
    </FieldGroup>
  );
});
