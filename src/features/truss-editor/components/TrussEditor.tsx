import {
  useCallback,
  useDeferredValue,
  useEffect,
  useLayoutEffect,
  useMemo,
  useRef,
  useState,
} from 'react';
import { useForm, useWatch, type FieldErrors, type Resolver } from 'react-hook-form';
import { Link, useBlocker, useNavigate } from 'react-router';
import { PROFILE_KIND_LABELS } from '../../../../shared/engine/profiles';
import { drawingTitle } from '../../../components/truss/dimensions';
import { DesignResults } from '../../../components/truss/DesignResults';
import { drawingOfStoredLine } from '../../../components/truss/run-design';
import { TrussDrawing } from '../../../components/truss/TrussDrawing';
import { Alert, Button, Card, Dialog, errorText, PageHeader } from '../../../components/ui';
import { isApiError } from '../../../lib/api-client';
import { useServerPreview } from '../api/preview-design';
import { useSaveLine } from '../api/save-line';
import { formToRequest, serverFieldErrors, type FormUnits } from '../form/convert';
import type { TrussFormErrors, TrussFormField, TrussFormValues } from '../form/values';
import type { FieldContext } from './FormFields';
import { CompareProfiles } from './CompareProfiles';
import type { DesignRules } from '../../../../shared/api/plant';
import { BracingFields } from './BracingFields';
import { PointLoadFields } from './PointLoadFields';
import { PrintedFacts } from './PrintedFacts';
import { ProfilePicker } from './ProfilePicker';
import { GeometryFields, LineFields, LoadFields, LumberFields } from './TrussFields';
import { useLiveDesign } from './use-live-design';

/** Props of {@link TrussEditor}. */
export interface TrussEditorProps {
  orderId: number;
  /** Absent for a new line. */
  lineId?: number;
  orderLabel: string;
  units: FormUnits;
  initial: TrussFormValues;
  /** Set when the line is approved: the form opens read-only with this note. */
  lockedNote?: string;
  /** The reviewer's comment when the design was sent back. */
  returnedNote?: string;
  /** The plant's design rules, so the live design matches the server's. */
  designRules?: DesignRules;
}

const LINE_FIELDS: TrussFormField[] = ['mark', 'quantity', 'plies'];
const APPROVED_NOTE =
  'This design is approved and locked. A change needs a new design and a new review.';

/** The editor's form, live drawing and results for one truss line. */
export function TrussEditor({
  orderId,
  lineId,
  orderLabel,
  units,
  initial,
  lockedNote,
  returnedNote,
  designRules,
}: TrussEditorProps) {
  const navigate = useNavigate();
  const [locked, setLocked] = useState<string | undefined>(lockedNote);
  const [saveError, setSaveError] = useState<string[]>([]);
  const readOnly = locked !== undefined;
  const resolver = useMemo<Resolver<TrussFormValues>>(
    () => (values) => {
      const reading = formToRequest(values, units);
      if (reading.request) return { values, errors: {} };
      const errors = Object.fromEntries(
        Object.entries(reading.errors).map(([k, message]) => [k, { type: 'validate', message }]),
      ) as FieldErrors<TrussFormValues>;
      return { values: {}, errors };
    },
    [units],
  );
  const { register, control, handleSubmit, setValue, setError, formState } =
    useForm<TrussFormValues>({
      defaultValues: initial,
      resolver,
    });
  // Keystroke → committed drawing, measured from the input event to the layout effect.
  const startedAt = useRef<number | null>(null);
  const watched = useWatch({ control });
  const values = useMemo(() => ({ ...initial, ...watched }) as TrussFormValues, [initial, watched]);
  const reading = useMemo(() => formToRequest(values, units), [values, units]);
  const live = useLiveDesign(reading.input, designRules);
  const server = useServerPreview(reading.input, live.crashed);
  const save = useSaveLine(orderId, lineId);
  // Leaving with unsaved edits asks first; a successful save leaves without asking.
  const leaving = useRef(false);
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) =>
      !readOnly &&
      !leaving.current &&
      formState.isDirty &&
      currentLocation.pathname !== nextLocation.pathname,
  );
  useEffect(() => {
    if (readOnly || !formState.isDirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [readOnly, formState.isDirty]);

  // Field messages: design fields speak at once (they drive the drawing); line fields once
  // touched or after a save attempt; the server's messages (set with setError) win.
  const errors: TrussFormErrors = {};
  for (const [field, message] of Object.entries(reading.errors) as [TrussFormField, string][]) {
    const lineField = LINE_FIELDS.includes(field);
    if (!lineField || formState.isSubmitted || formState.touchedFields[field])
      errors[field] = message;
  }
  for (const [field, e] of Object.entries(formState.errors)) {
    if (e?.type === 'server' && typeof e.message === 'string')
      errors[field as TrussFormField] = e.message;
  }
  // Stable while the messages are unchanged, so the memoised field groups skip re-rendering
  // on keystrokes that change only the drawing (most of them).
  const errorsKey = JSON.stringify(errors);
  const ctx = useMemo<FieldContext>(
    () => ({ register, errors: JSON.parse(errorsKey) as TrussFormErrors, readOnly }),
    [register, errorsKey, readOnly],
  );
  const onProfile = useCallback(
    (kind: TrussFormValues['profile']) => {
      startedAt.current = performance.now();
      setValue('profile', kind, { shouldDirty: true });
    },
    [setValue],
  );

  const drawingBox = useRef<HTMLDivElement>(null);
  const run = live.run;
  useLayoutEffect(() => {
    const svg = drawingBox.current?.querySelector('[data-testid="truss-drawing"]');
    if (!(svg instanceof SVGElement) || startedAt.current === null) return;
    svg.dataset.designMs = (performance.now() - startedAt.current).toFixed(2);
    startedAt.current = null;
  }, [run, live.stale]);

  // The server preview stands in only when the local engine crashed (a bug, not bad input).
  const fallback = useMemo(
    () =>
      live.crashed && server.data && reading.input
        ? { presented: server.data, drawing: drawingOfStoredLine(reading.input, server.data) }
        : null,
    [live.crashed, server.data, reading.input],
  );
  const shown = fallback ?? run;
  // The tables follow the drawing in a deferred render: the drawing commits first on every
  // keystroke, and a newer keystroke interrupts an unfinished table render instead of waiting.
  const presented = useDeferredValue(shown?.presented);
  const onValid = (formValues: TrussFormValues) => {
    const request = formToRequest(formValues, units).request;
    if (!request) return;
    setSaveError([]);
    save.mutate(request, {
      onSuccess: (line) => {
        leaving.current = true;
        void navigate(`/orders/${orderId}`, {
          state: {
            saved: `Saved ${line.mark}: ${line.description} — ${line.designOk ? 'the design passes' : 'the design fails its checks'}.`,
          },
        });
      },
      onError: (error) => {
        if (isApiError(error) && error.status === 409 && error.code === 'locked') {
          setLocked(error.message);
          return;
        }
        const { errors: fieldErrors, unplaced } = serverFieldErrors(
          isApiError(error) ? error.fields : {},
        );
        for (const [field, message] of Object.entries(fieldErrors)) {
          setError(field as TrussFormField, { type: 'server', message });
        }
        setSaveError([errorText(error), ...unplaced]);
      },
    });
  };

  return (
    <>
      <PageHeader
        title="Truss editor"
        description={orderLabel}
        actions={
          <Link
            to={`/orders/${orderId}`}
            className="text-sm font-medium text-timber-700 underline underline-offset-2"
          >
            Back to the order
          </Link>
        }
      />
      {returnedNote && !locked ? (
        <Alert tone="warning" title="Sent back by the design reviewer" className="mb-4">
          {returnedNote}
        </Alert>
      ) : null}
      {locked ? (
        <Alert tone="warning" title="Read only" className="mb-4">
          {locked === APPROVED_NOTE ? locked : `${locked} ${APPROVED_NOTE}`}
        </Alert>
      ) : null}
      <form
        noValidate
        onSubmit={(e) => void handleSubmit(onValid)(e)}
        onInputCapture={() => (startedAt.current = performance.now())}
        className="flex flex-col gap-4 print:block print:space-y-3"
      >
        <Card title="Truss type" className="print:hidden">
          <ProfilePicker value={values.profile} disabled={readOnly} onChange={onProfile} />
        </Card>
        <div className="grid items-start gap-4 lg:grid-cols-[minmax(20rem,26rem)_minmax(0,1fr)] print:block">
          {/* On paper the fields print as a fact list under the drawing instead. */}
          <Card className="print:hidden">
            <div className="flex flex-col gap-5">
              <LineFields ctx={ctx} />
              <GeometryFields ctx={ctx} units={units} kind={values.profile} />
              <LoadFields ctx={ctx} units={units} />
              <PointLoadFields ctx={ctx} control={control} units={units} />
              <LumberFields ctx={ctx} units={units} />
              <BracingFields
                ctx={ctx}
                units={units}
                ceiling={values.ceiling !== false}
                sheathing={values.sheathing !== false}
              />
              {saveError.length > 0 ? (
                <Alert tone="danger" title="Not saved">
                  {saveError.map((m) => (
                    <p key={m}>{m}</p>
                  ))}
                </Alert>
              ) : null}
              {readOnly ? null : (
                <div className="sticky bottom-0 -mx-4 -mb-4 border-t border-sand-200 bg-white px-4 py-3 print:hidden">
                  <Button type="submit" busy={save.isPending} className="w-full">
                    Save truss
                  </Button>
                </div>
              )}
            </div>
          </Card>
          <div className="flex min-w-0 flex-col gap-4 print:block print:space-y-3">
            <Card title="Drawing" className="break-inside-avoid">
              <div ref={drawingBox}>
                {shown ? (
                  <TrussDrawing
                    model={shown.drawing}
                    units={units}
                    title={drawingTitle(PROFILE_KIND_LABELS[values.profile], shown.drawing, units)}
                    stale={live.stale && !fallback}
                    staleNote={live.note ? `${live.note} Showing the last valid truss.` : undefined}
                    designMs={live.engineMs}
                  />
                ) : (
                  <p className="py-12 text-center text-sand-600">
                    {live.note ?? 'Fix the highlighted fields to see the truss.'}
                  </p>
                )}
              </div>
            </Card>
            <PrintedFacts
              input={reading.input}
              presented={presented}
              mark={values.mark}
              quantity={values.quantity}
              plies={values.plies}
            />
            {/* A chooser, not part of the design: left off paper. */}
            <div className="print:hidden">
              <CompareProfiles
                input={reading.input}
                current={values.profile}
                disabled={readOnly}
                onPick={onProfile}
              />
            </div>
            {presented ? (
              <div>
                {live.stale && !fallback ? (
                  <Alert tone="warning" className="mb-2">
                    These results belong to the last valid truss, not to the fields as they are now.
                  </Alert>
                ) : null}
                <div className={live.stale && !fallback ? 'opacity-50' : undefined}>
                  <DesignResults design={presented} />
                </div>
              </div>
            ) : null}
          </div>
        </div>
      </form>
      <Dialog
        open={blocker.state === 'blocked'}
        title="Leave without saving?"
        onClose={() => blocker.reset?.()}
        footer={
          <>
            <Button variant="secondary" onClick={() => blocker.reset?.()}>
              Keep editing
            </Button>
            <Button variant="danger" onClick={() => blocker.proceed?.()}>
              Leave and discard changes
            </Button>
          </>
        }
      >
        <p>This truss has changes that are not saved. They are lost if you leave now.</p>
      </Dialog>
    </>
  );
}
