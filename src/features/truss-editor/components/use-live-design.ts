import { useMemo, useState } from 'react';
import type { DesignInput } from '../../../../shared/api/design';
import type { DesignRules } from '../../../../shared/api/plant';
import { isEngineError } from '../../../../shared/engine/errors';
import { runDesign, type DesignRun } from '../../../components/truss/run-design';

/** What the editor shows: the current design, or the last good one marked stale and why. */
export interface LiveDesign {
  run: DesignRun | null;
  stale: boolean;
  /** Why the drawing is stale (the engine's refusal, or the form being invalid). */
  note?: string;
  /** Engine plus presentation time of the last run, ms. */
  engineMs?: number;
  /** The local engine failed in a way it should not (a bug): the server preview takes over. */
  crashed: boolean;
}

type Attempt =
  | { kind: 'ok'; run: DesignRun; ms: number }
  | { kind: 'invalid' }
  | { kind: 'refused'; message: string }
  | { kind: 'crashed'; message: string };

const attempt = (inputKey: string | null, amplify: boolean): Attempt => {
  if (inputKey === null) return { kind: 'invalid' };
  const started = performance.now();
  try {
    const run = runDesign(JSON.parse(inputKey) as DesignInput, {
      ...(amplify && { amplifyPanelPointMoment: true }),
    });
    return { kind: 'ok', run, ms: performance.now() - started };
  } catch (error) {
    if (isEngineError(error)) return { kind: 'refused', message: error.message };
    return { kind: 'crashed', message: error instanceof Error ? error.message : String(error) };
  }
};

/**
 * Designs the truss in the browser on every change of the checked input, memoised on the input
 * itself (not on object identity), and keeps the last good design to show dimmed while the
 * input is invalid or the engine refuses it. `rules` are the plant's design rules. No debounce: a run takes a few milliseconds.
 */
export function useLiveDesign(input: DesignInput | null, rules?: DesignRules): LiveDesign {
  const inputKey = input ? JSON.stringify(input) : null;
  const amplify = rules?.amplifyPanelPointMoment === true;
  const result = useMemo(() => attempt(inputKey, amplify), [inputKey, amplify]);
  const [lastGood, setLastGood] = useState<DesignRun | null>(null);
  // Remember the newest good run (React's "adjust state while rendering" pattern: no effect).
  if (result.kind === 'ok' && lastGood !== result.run) setLastGood(result.run);

  switch (result.kind) {
    case 'ok':
      return { run: result.run, stale: false, engineMs: result.ms, crashed: false };
    case 'invalid':
      return { run: lastGood, stale: true, crashed: false };
    case 'refused':
      return { run: lastGood, stale: true, note: result.message, crashed: false };
    case 'crashed':
      return { run: lastGood, stale: true, note: result.message, crashed: true };
  }
}
