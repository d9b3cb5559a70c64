import { useState } from 'react';
import {
  stockSettingsSchema,
  type LumberStock,
  type StockSettings,
} from '../../../../shared/api/stock';
import {
  Alert,
  Button,
  Card,
  ErrorMessage,
  Field,
  Input,
  PageHeader,
  QueryState,
} from '../../../components/ui';
import { formatDateTime } from '../../../lib/format';
import { useStockSettings, type StoredStockSettings } from '../api/get-stock-settings';
import { useSaveStockSettings } from '../api/save-stock-settings';

const numberOrNull = (text: string) => (text.trim() === '' ? null : Number(text));

/** A right-aligned number input; blank shows for NaN or null. */
function NumberInput({
  value,
  onChange,
  step = 'any',
  ...rest
}: {
  value: number | null;
  onChange: (text: string) => void;
  step?: number | string;
  disabled: boolean;
  id?: string;
  'aria-label'?: string;
}) {
  return (
    <Input
      type="number"
      step={step}
      value={value === null || Number.isNaN(value) ? '' : value}
      className="max-w-28 text-right tabular-nums"
      onChange={(e) => onChange(e.target.value)}
      {...rest}
    />
  );
}

/** One lumber's stock lengths: length, price, count on hand (blank = as many as needed). */
function LumberTable({
  entry,
  canEdit,
  onChange,
  onRemove,
}: {
  entry: LumberStock;
  canEdit: boolean;
  onChange: (next: LumberStock) => void;
  onRemove: () => void;
}) {
  const setStock = (i: number, patch: Partial<LumberStock['stocks'][number]>) =>
    onChange({
      ...entry,
      stocks: entry.stocks.map((s, k) => (k === i ? { ...s, ...patch } : s)),
    });
  const id = entry.lumber.replace(/\W+/g, '-');
  return (
    <Card flush>
      <div className="flex items-center justify-between gap-3 p-4 pb-2">
        <Field label="Lumber (a size such as 2x4, or size and grade)" htmlFor={`lumber-${id}`}>
          <Input
            id={`lumber-${id}`}
            value={entry.lumber}
            disabled={!canEdit}
            className="max-w-48"
            onChange={(e) => onChange({ ...entry, lumber: e.target.value })}
          />
        </Field>
        {canEdit ? (
          <Button variant="ghost" size="sm" onClick={onRemove}>
            Remove lumber
          </Button>
        ) : null}
      </div>
      <table className="w-full text-sm">
        <thead className="text-left text-sand-600">
          <tr>
            <th className="px-4 py-2 font-medium">Stock length (ft)</th>
            <th className="px-4 py-2 font-medium">Price per board ($)</th>
            <th className="px-4 py-2 font-medium">On hand (blank: as needed)</th>
            <th className="px-4 py-2" />
          </tr>
        </thead>
        <tbody>
          {entry.stocks.map((s, i) => (
            <tr key={i} className="border-t border-sand-200">
              <td className="px-4 py-1.5">
                <NumberInput
                  aria-label={`${entry.lumber} stock length ${i + 1} (ft)`}
                  value={s.lengthFt}
                  disabled={!canEdit}
                  onChange={(t) => setStock(i, { lengthFt: Number(t) })}
                />
              </td>
              <td className="px-4 py-1.5">
                <NumberInput
                  aria-label={`${entry.lumber} ${s.lengthFt} ft price`}
                  step="0.01"
                  value={s.price}
                  disabled={!canEdit}
                  onChange={(t) => setStock(i, { price: Number(t) })}
                />
              </td>
              <td className="px-4 py-1.5">
                <NumberInput
                  aria-label={`${entry.lumber} ${s.lengthFt} ft on hand`}
                  step={1}
                  value={s.onHand}
                  disabled={!canEdit}
                  onChange={(t) => setStock(i, { onHand: numberOrNull(t) })}
                />
              </td>
              <td className="px-4 py-1.5 text-right">
                {canEdit ? (
                  <Button
                    variant="ghost"
                    size="sm"
                    onClick={() =>
                      onChange({ ...entry, stocks: entry.stocks.filter((_, k) => k !== i) })
                    }
                  >
                    Remove
                  </Button>
                ) : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      {canEdit ? (
        <div className="p-4 pt-2">
          <Button
            variant="secondary"
            size="sm"
            onClick={() => {
              const longest = Math.max(0, ...entry.stocks.map((s) => s.lengthFt));
              onChange({
                ...entry,
                stocks: [...entry.stocks, { lengthFt: longest + 2, price: 1, onHand: null }],
              });
            }}
          >
            Add a length
          </Button>
        </div>
      ) : null}
    </Card>
  );
}

function StockForm({ stored, canEdit }: { stored: StoredStockSettings; canEdit: boolean }) {
  const [draft, setDraft] = useState<StockSettings>(() => ({
    kerfIn: stored.kerfIn,
    trimIn: stored.trimIn,
    lumbers: stored.lumbers,
  }));
  const [problem, setProblem] = useState<string | null>(null);
  const save = useSaveStockSettings();
  const submit = () => {
    const parsed = stockSettingsSchema.safeParse(draft);
    if (!parsed.success) {
      setProblem(parsed.error.issues.map((i) => i.message).join('; '));
      return;
    }
    setProblem(null);
    save.mutate(parsed.data);
  };
  return (
    <form
      className="flex flex-col gap-4"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <Card flush>
        <div className="flex flex-wrap gap-6 p-4">
          <Field
            label="Saw kerf (in)"
            htmlFor="stock-kerf"
            hint="One kerf between neighbouring pieces."
          >
            <NumberInput
              id="stock-kerf"
              value={draft.kerfIn}
              disabled={!canEdit}
              onChange={(t) => setDraft({ ...draft, kerfIn: Number(t) })}
            />
          </Field>
          <Field label="End trim (in)" htmlFor="stock-trim" hint="Taken off every board.">
            <NumberInput
              id="stock-trim"
              value={draft.trimIn}
              disabled={!canEdit}
              onChange={(t) => setDraft({ ...draft, trimIn: Number(t) })}
            />
          </Field>
        </div>
      </Card>
      {draft.lumbers.map((entry, i) => (
        <LumberTable
          key={i}
          entry={entry}
          canEdit={canEdit}
          onChange={(next) =>
            setDraft({ ...draft, lumbers: draft.lumbers.map((l, k) => (k === i ? next : l)) })
          }
          onRemove={() => setDraft({ ...draft, lumbers: draft.lumbers.filter((_, k) => k !== i) })}
        />
      ))}
      {problem ? (
        <Alert tone="danger" title="Not saved">
          {problem}
        </Alert>
      ) : null}
      {save.error ? <ErrorMessage title="Not saved" error={save.error} /> : null}
      {canEdit ? (
        <div className="flex gap-3">
          <Button
            type="button"
            variant="secondary"
            onClick={() =>
              setDraft({
                ...draft,
                lumbers: [
                  ...draft.lumbers,
                  {
                    lumber: `2x${4 + 2 * draft.lumbers.length}`,
                    stocks: [{ lengthFt: 16, price: 1, onHand: null }],
                  },
                ],
              })
            }
          >
            Add a lumber
          </Button>
          <Button type="submit" busy={save.isPending}>
            Save stock
          </Button>
        </div>
      ) : null}
    </form>
  );
}

/** `/stock`: the lumber the plant buys — lengths, prices, counts on hand — kerf and trim. */
export function StockSettingsPage({ canEdit }: { canEdit: boolean }) {
  const settings = useStockSettings();
  return (
    <>
      <PageHeader
        title="Lumber stock"
        description="The stock lengths each lumber comes in, their prices and counts on hand, the saw kerf and the end trim that every lumber plan is cut from."
      />
      <QueryState query={settings} what="the stock settings">
        {(s) => (
          <div className="flex flex-col gap-4">
            {s.demo ? (
              <Alert tone="warning" title="Invented demo values">
                These stock lengths and prices are invented defaults (8–20 ft in 2 ft steps), not
                real prices. Enter your plant’s stock and save to replace them.
              </Alert>
            ) : null}
            {s.updatedAt ? (
              <p className="text-sm text-sand-600">
                Last saved {formatDateTime(s.updatedAt)}
                {s.updatedBy ? ` by ${s.updatedBy}` : ''}.
              </p>
            ) : null}
            <StockForm key={s.updatedAt ?? 'demo'} stored={s} canEdit={canEdit} />
          </div>
        )}
      </QueryState>
    </>
  );
}
