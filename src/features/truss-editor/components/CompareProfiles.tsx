import { useState } from 'react';
import type { ProfileComparison } from '../../../../shared/api/compare';
import type { DesignInputDraft } from '../../../../shared/api/design';
import { PROFILE_KIND_LABELS } from '../../../../shared/engine/profiles';
import type { ProfileKind } from '../../../../shared/engine/profiles/types';
import { formatCsi } from '../../../components/truss/csi';
import { Alert, Button, Card, ErrorMessage, Spinner } from '../../../components/ui';
import { useProfileComparison } from '../api/compare-profiles';

const money = (amount: number, currency: string) =>
  new Intl.NumberFormat('en-US', { style: 'currency', currency }).format(amount);

/** The best passing row: cheapest, else lightest (no prices), else none. */
function bestOf(rows: ProfileComparison[]): ProfileKind | null {
  const passing = rows.filter((r) => r.fits && r.ok);
  if (passing.length === 0) return null;
  const key = (r: ProfileComparison) => r.unitPrice ?? r.boardFeet ?? Infinity;
  return passing.reduce((a, b) => (key(b) < key(a) ? b : a)).profile;
}

/**
 * "Compare profiles": the same span, pitch, heels, overhangs and loads designed as every profile
 * that fits, side by side, with one click to switch the editor to another.
 */
export function CompareProfiles({
  input,
  current,
  disabled,
  onPick,
}: {
  input: DesignInputDraft | null;
  current: ProfileKind;
  disabled: boolean;
  onPick: (kind: ProfileKind) => void;
}) {
  const [asked, setAsked] = useState<DesignInputDraft | null>(null);
  const comparison = useProfileComparison(asked);
  const outdated =
    asked !== null &&
    JSON.stringify({ ...asked, profile: undefined }) !==
      JSON.stringify({ ...input, profile: undefined });
  const data = comparison.data;
  const best = data ? bestOf(data.rows) : null;
  return (
    <Card
      title="Compare profiles"
      actions={
        <Button
          size="sm"
          variant="secondary"
          disabled={!input}
          busy={comparison.isFetching}
          onClick={() => setAsked(input)}
        >
          {asked ? 'Compare again' : 'Compare every profile'}
        </Button>
      }
    >
      {!asked ? (
        <p className="text-sm text-sand-600">
          Design this span, pitch, heels, overhangs and loads as every truss type in about a second:
          which pass, their highest CSI, lumber, plates, estimated price and weight.
        </p>
      ) : comparison.error ? (
        <ErrorMessage title="Could not compare" error={comparison.error} />
      ) : !data ? (
        <Spinner label="Designing every profile…" />
      ) : (
        <>
          {outdated ? (
            <Alert tone="warning" className="mb-3">
              The fields changed since this comparison. Compare again to update it.
            </Alert>
          ) : null}
          <div className="overflow-x-auto">
            <table className="w-full text-sm" data-testid="profile-comparison">
              <caption className="sr-only">Profiles compared</caption>
              <thead>
                <tr className="border-b border-sand-200 text-left text-xs uppercase tracking-wide text-sand-600">
                  <th className="py-2 pr-3">Profile</th>
                  <th className="py-2 pr-3">Design</th>
                  <th className="py-2 pr-3 text-right">Max CSI</th>
                  <th className="py-2 pr-3 text-right">Board ft</th>
                  <th className="py-2 pr-3 text-right">Plates</th>
                  <th className="py-2 pr-3 text-right">Est. price</th>
                  <th className="py-2 pr-3 text-right">Est. weight</th>
                  <th className="py-2">
                    <span className="sr-only">Switch</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {data.rows.map((r) => (
                  <tr
                    key={r.profile}
                    className={
                      r.profile === current
                        ? 'border-b border-sand-100 bg-timber-50'
                        : 'border-b border-sand-100'
                    }
                  >
                    <th scope="row" className="py-2 pr-3 text-left font-medium text-sand-900">
                      {PROFILE_KIND_LABELS[r.profile]}
                      {r.profile === best ? (
                        <span className="ml-2 rounded bg-success-50 px-1.5 py-0.5 text-xs font-medium text-success-800">
                          {r.unitPrice !== null ? 'lowest price' : 'least lumber'}
                        </span>
                      ) : null}
                    </th>
                    {r.fits ? (
                      <>
                        <td
                          className={
                            r.ok
                              ? 'py-2 pr-3 text-success-800'
                              : 'py-2 pr-3 font-medium text-danger-700'
                          }
                        >
                          {r.ok ? 'Passes' : 'Fails'}
                        </td>
                        <td className="py-2 pr-3 text-right tabular-nums">{formatCsi(r.maxCsi)}</td>
                        <td className="py-2 pr-3 text-right tabular-nums">
                          {r.boardFeet?.toFixed(1)}
                        </td>
                        <td className="py-2 pr-3 text-right tabular-nums">{r.plates}</td>
                        <td className="py-2 pr-3 text-right tabular-nums">
                          {r.unitPrice !== null && r.currency
                            ? money(r.unitPrice, r.currency)
                            : '—'}
                        </td>
                        <td className="py-2 pr-3 text-right tabular-nums">
                          {r.weight?.toFixed(0)} {data.weightUnit}
                        </td>
                      </>
                    ) : (
                      <td colSpan={6} className="py-2 pr-3 text-sand-600">
                        Does not fit: {r.message}
                      </td>
                    )}
                    <td className="py-2 text-right">
                      {r.profile === current ? (
                        <span className="text-xs text-sand-600">Current</span>
                      ) : r.fits ? (
                        <Button
                          size="sm"
                          variant="ghost"
                          disabled={disabled}
                          onClick={() => onPick(r.profile)}
                        >
                          Use {PROFILE_KIND_LABELS[r.profile]}
                        </Button>
                      ) : null}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="mt-2 text-xs text-sand-600">
            Per truss, all plies. Prices are estimates from the price book
            {data.demoPrices ? ' (invented demo prices)' : ''}; weights are estimates from the
            lumber (NDS specific gravity at the 19 % moisture ceiling of dry lumber, plates not
            included). A scissor uses half the top pitch for its bottom chord unless one is set.
            Results are preliminary until reviewed.
          </p>
        </>
      )}
    </Card>
  );
}
