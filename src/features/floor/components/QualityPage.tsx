import { formatDateTime } from '../../../lib/format';
import clsx from 'clsx';
import { useState } from 'react';
import { INSPECTION_CHECKS } from '../../../../shared/api/production';
import { Alert, Button, Card, ErrorMessage, PageHeader, QueryState } from '../../../components/ui';
import { useInspectionLog, useRecordInspection } from '../api/inspections';

const LABELS: Record<(typeof INSPECTION_CHECKS)[number], string> = {
  dimensions: 'Dimensions',
  lumberGrade: 'Lumber grade',
  platePosition: 'Plate position',
  plateEmbedment: 'Plate embedment',
  gaps: 'Member gaps',
};
const allPass = () =>
  Object.fromEntries(INSPECTION_CHECKS.map((c) => [c, true])) as Record<
    (typeof INSPECTION_CHECKS)[number],
    boolean
  >;

/** The quality-control log: stations due this week, a record form and the latest records. */
export function QualityPage() {
  const query = useInspectionLog();
  const record = useRecordInspection();
  const [tableId, setTableId] = useState<number | null>(null);
  const [truss, setTruss] = useState('');
  const [notes, setNotes] = useState('');
  const [checks, setChecks] = useState(allPass);

  return (
    <div>
      <PageHeader
        title="Quality control"
        description="At least three trusses per set-up station per shift each week (ANSI/TPI 1-2014, Section 3.3.2)."
      />
      <QueryState query={query} what="the inspection log">
        {(log) => {
          const station = tableId ?? log.stations[0]?.tableId ?? 0;
          return (
            <div className="flex flex-col gap-6">
              <div className="grid grid-cols-2 gap-3 md:grid-cols-4">
                {log.stations.map((s) => (
                  <Card key={s.tableId} className="p-4">
                    <p className="font-semibold">{s.name}</p>
                    <p className={clsx('text-lg', s.due ? 'text-warning-800' : 'text-success-800')}>
                      {s.due ? `${s.due} due` : 'Done for the week'}
                    </p>
                    <p className="text-sm text-sand-600">
                      {s.done} of {s.required} since {log.weekOf}
                    </p>
                  </Card>
                ))}
              </div>
              <Card className="p-4">
                <form
                  className="flex flex-col gap-3"
                  onSubmit={(e) => {
                    e.preventDefault();
                    record.mutate(
                      { tableId: station, lineId: null, truss, checks, notes },
                      {
                        onSuccess: () => {
                          setTruss('');
                          setNotes('');
                          setChecks(allPass());
                        },
                      },
                    );
                  }}
                >
                  <h2 className="text-lg font-semibold">Record an inspection</h2>
                  <label className="flex flex-col gap-1">
                    Station
                    <select
                      className="h-12 rounded border border-sand-300 px-2"
                      value={station}
                      onChange={(e) => setTableId(Number(e.target.value))}
                    >
                      {log.stations.map((s) => (
                        <option key={s.tableId} value={s.tableId}>
                          {s.name}
                        </option>
                      ))}
                    </select>
                  </label>
                  <label className="flex flex-col gap-1">
                    Truss (order, mark and number)
                    <input
                      className="h-12 rounded border border-sand-300 px-2"
                      value={truss}
                      onChange={(e) => setTruss(e.target.value)}
                      placeholder="2026-0012 T1 #3"
                    />
                  </label>
                  <fieldset className="flex flex-wrap gap-3">
                    <legend className="mb-1">Checks (untick what fails)</legend>
                    {INSPECTION_CHECKS.map((c) => (
                      <label
                        key={c}
                        className="flex min-h-12 items-center gap-2 rounded border border-sand-300 px-3"
                      >
                        <input
                          type="checkbox"
                          className="size-6"
                          checked={checks[c]}
                          onChange={(e) => setChecks({ ...checks, [c]: e.target.checked })}
                        />
                        {LABELS[c]}
                      </label>
                    ))}
                  </fieldset>
                  <label className="flex flex-col gap-1">
                    Notes
                    <textarea
                      className="rounded border border-sand-300 p-2"
                      value={notes}
                      onChange={(e) => setNotes(e.target.value)}
                    />
                  </label>
                  {record.error ? <ErrorMessage error={record.error} /> : null}
                  <div>
                    <Button type="submit" busy={record.isPending}>
                      Record inspection
                    </Button>
                  </div>
                </form>
              </Card>
              {log.records.length ? (
                <Card className="p-0">
                  <table className="w-full text-sm">
                    <thead className="bg-sand-50 text-left">
                      <tr>
                        <th className="p-2">When</th>
                        <th className="p-2">Station</th>
                        <th className="p-2">Truss</th>
                        <th className="p-2">Result</th>
                        <th className="p-2">Inspector</th>
                      </tr>
                    </thead>
                    <tbody>
                      {log.records.map((r) => (
                        <tr key={r.id} className="border-t border-sand-200">
                          <td className="p-2">{formatDateTime(r.at)}</td>
                          <td className="p-2">{r.station}</td>
                          <td className="p-2">{r.truss}</td>
                          <td className="p-2">
                            {r.passed
                              ? 'Pass'
                              : `Fail: ${Object.entries(r.checks)
                                  .filter(([, v]) => !v)
                                  .map(([k]) => LABELS[k as keyof typeof LABELS] ?? k)
                                  .join(', ')}`}
                            {r.notes ? ` — ${r.notes}` : ''}
                          </td>
                          <td className="p-2">{r.inspector}</td>
                        </tr>
                      ))}
                    </tbody>
                  </table>
                </Card>
              ) : (
                <Alert>No inspections logged yet.</Alert>
              )}
            </div>
          );
        }}
      </QueryState>
    </div>
  );
}
