import { useState } from 'react';
import type { ProductionSettings } from '../../../../shared/api/production';
import { Alert, Button, Card, ErrorMessage, PageHeader, QueryState } from '../../../components/ui';
import { useProductionSettings, useSaveProductionSettings } from '../api/settings';

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];
const input = 'h-9 w-24 rounded border border-sand-300 px-2';

function num(v: string) {
  return v === '' ? Number.NaN : Number(v);
}

function SettingsForm({ initial, demo }: { initial: ProductionSettings; demo: boolean }) {
  const save = useSaveProductionSettings();
  const [s, setS] = useState(initial);
  const [closures, setClosures] = useState(initial.closures.join('\n'));
  const setTable = (i: number, patch: Partial<ProductionSettings['tables'][number]>) =>
    setS({ ...s, tables: s.tables.map((t, j) => (j === i ? { ...t, ...patch } : t)) });
  const labour = (k: keyof ProductionSettings['labour'], label: string) => (
    <label className="flex flex-col gap-1 text-sm">
      {label}
      <input
        className={input}
        type="number"
        step="any"
        value={Number.isNaN(s.labour[k]) ? '' : s.labour[k]}
        onChange={(e) => setS({ ...s, labour: { ...s.labour, [k]: num(e.target.value) } })}
      />
    </label>
  );
  return (
    <form
      className="flex flex-col gap-6"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate({
          ...s,
          closures: closures
            .split(/\s+/)
            .map((c) => c.trim())
            .filter(Boolean),
        });
      }}
    >
      {demo ? (
        <Alert tone="warning">
          These are invented demo settings; save your plant’s own to plan with them.
        </Alert>
      ) : null}
      <Card title="Assembly tables">
        <table className="text-sm">
          <thead>
            <tr className="text-left">
              <th className="p-1">Name</th>
              <th className="p-1">Crew</th>
              <th className="p-1">Shifts</th>
              <th className="p-1">Hours per shift</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {s.tables.map((t, i) => (
              <tr key={t.id}>
                <td className="p-1">
                  <input
                    className="h-9 rounded border border-sand-300 px-2"
                    aria-label="Table name"
                    value={t.name}
                    onChange={(e) => setTable(i, { name: e.target.value })}
                  />
                </td>
                {(['crew', 'shifts', 'hoursPerShift'] as const).map((k) => (
                  <td key={k} className="p-1">
                    <input
                      className={input}
                      type="number"
                      step="any"
                      aria-label={k}
                      value={Number.isNaN(t[k]) ? '' : t[k]}
                      onChange={(e) => setTable(i, { [k]: num(e.target.value) })}
                    />
                  </td>
                ))}
                <td className="p-1">
                  <Button
                    size="sm"
                    variant="secondary"
                    onClick={() => setS({ ...s, tables: s.tables.filter((_, j) => j !== i) })}
                  >
                    Remove
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
        <Button
          size="sm"
          variant="secondary"
          className="mt-2"
          onClick={() => {
            const id = Math.max(0, ...s.tables.map((t) => t.id)) + 1;
            setS({
              ...s,
              tables: [
                ...s.tables,
                { id, name: `Table ${id}`, crew: 3, shifts: 1, hoursPerShift: 8 },
              ],
            });
          }}
        >
          Add a table
        </Button>
      </Card>
      <Card title="Working days and closures">
        <div className="mb-3 flex gap-3">
          {WEEKDAYS.map((d, i) => (
            <label key={d} className="flex items-center gap-1">
              <input
                type="checkbox"
                checked={s.workingDays.includes(i)}
                onChange={(e) =>
                  setS({
                    ...s,
                    workingDays: e.target.checked
                      ? [...s.workingDays, i].sort()
                      : s.workingDays.filter((w) => w !== i),
                  })
                }
              />
              {d}
            </label>
          ))}
        </div>
        <label className="flex flex-col gap-1 text-sm">
          Closed dates (one per line, e.g. 2027-12-25)
          <textarea
            className="h-24 w-64 rounded border border-sand-300 p-2"
            value={closures}
            onChange={(e) => setClosures(e.target.value)}
          />
        </label>
      </Card>
      <Card title="How long a truss takes">
        <p className="mb-3 text-sm text-sand-600">
          Minutes per truss = factor × (per truss + plies × (per piece × pieces + per joint × joints
          + per plate × plates)); each mark of an order adds its set-up once.
        </p>
        <div className="flex flex-wrap gap-4">
          <label className="flex flex-col gap-1 text-sm">
            Set-up minutes per mark
            <input
              className={input}
              type="number"
              step="any"
              value={Number.isNaN(s.setupMinutes) ? '' : s.setupMinutes}
              onChange={(e) => setS({ ...s, setupMinutes: num(e.target.value) })}
            />
          </label>
          {labour('perTruss', 'Per truss')}
          {labour('perPiece', 'Per piece')}
          {labour('perJoint', 'Per joint')}
          {labour('perPlate', 'Per plate')}
          {labour('factor', 'Calibration factor')}
          <label className="flex flex-col gap-1 text-sm">
            Plan ahead (days)
            <input
              className={input}
              type="number"
              value={Number.isNaN(s.horizonDays) ? '' : s.horizonDays}
              onChange={(e) => setS({ ...s, horizonDays: num(e.target.value) })}
            />
          </label>
        </div>
      </Card>
      {save.error ? <ErrorMessage error={save.error} /> : null}
      {save.isSuccess ? <Alert tone="success">Saved; the schedule is re-planned.</Alert> : null}
      <div>
        <Button type="submit" busy={save.isPending}>
          Save settings
        </Button>
      </div>
    </form>
  );
}

/** The plant manager's production settings. */
export function ProductionSettingsPage() {
  const query = useProductionSettings();
  return (
    <div>
      <PageHeader
        title="Production settings"
        description="Tables, working days and labour times the schedule plans with."
      />
      <QueryState query={query} what="the production settings">
        {(r) => <SettingsForm initial={r.settings} demo={r.demo} />}
      </QueryState>
    </div>
  );
}
