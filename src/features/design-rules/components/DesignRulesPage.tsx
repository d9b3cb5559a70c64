import { useState } from 'react';
import { designRulesSchema, type DesignRulesDetail } from '../../../../shared/api/plant';
import { isApiError } from '../../../lib/api-client';
import { Alert, Button, Card, ErrorMessage, PageHeader, QueryState } from '../../../components/ui';
import { useDesignRules } from '../api/get-design-rules';
import { useSaveDesignRules } from '../api/save-design-rules';

/** The two ways a chord's panel-point moment can be checked, in the plant manager's words. */
const CHOICES = [
  {
    value: false,
    title: 'Common practice (default)',
    text:
      'At a panel point the web holds the chord in line, so the moment there is checked as ' +
      '(fc/Fc′)² + fb/Fb′ without the buckling amplifier. The moment between panel points is ' +
      'amplified by 1/(1 − fc/FcE1) as NDS 2018 §3.9.2 requires.',
  },
  {
    value: true,
    title: 'Stricter: amplify the panel-point moment too',
    text:
      'Reads NDS 2018 §3.9.2 literally: the panel-point moment is also divided by ' +
      '(1 − fc/FcE1). Chords in heavy compression come out larger or fail where common ' +
      'practice passes them; nothing gets weaker.',
  },
] as const;

type Save = ReturnType<typeof useSaveDesignRules>;

function RulesForm({ initial, save }: { initial: DesignRulesDetail; save: Save }) {
  const [amplify, setAmplify] = useState(initial.amplifyPanelPointMoment);
  const stale = isApiError(save.error) && save.error.status === 409;
  const changed = amplify !== initial.amplifyPanelPointMoment;
  return (
    <form
      className="flex max-w-3xl flex-col gap-6"
      onSubmit={(e) => {
        e.preventDefault();
        const rules = designRulesSchema.parse({ amplifyPanelPointMoment: amplify });
        save.mutate({ ...rules, version: initial.version });
      }}
    >
      <Card title="Compression chords: the moment at a panel point">
        <p className="mb-4 text-sm text-sand-700">
          A top chord (and a bottom chord under uplift) is pushed and bent at once. NDS 2018 §3.9.2
          amplifies the bending by 1/(1 − fc/FcE1) for the chord bowing out between its supports.
          Every new design of the plant uses the rule chosen here, and its notes say which.
        </p>
        <fieldset className="flex flex-col gap-3">
          <legend className="sr-only">How panel-point moments are checked</legend>
          {CHOICES.map((c) => (
            <label
              key={String(c.value)}
              className="flex cursor-pointer items-start gap-3 rounded border border-sand-200 p-3 has-[:checked]:border-timber-600 has-[:checked]:bg-timber-50"
            >
              <input
                type="radio"
                name="amplifyPanelPointMoment"
                className="mt-1"
                checked={amplify === c.value}
                onChange={() => setAmplify(c.value)}
              />
              <span className="flex flex-col gap-1">
                <span className="font-medium text-sand-900">{c.title}</span>
                <span className="text-sm text-sand-700">{c.text}</span>
              </span>
            </label>
          ))}
        </fieldset>
        <p className="mt-4 text-sm text-sand-600">
          Designs already saved keep the rule they were made with; a line designed again (for
          instance after a load change) takes the new one.
        </p>
      </Card>
      {stale ? (
        <Alert tone="warning" title="Someone else changed the rules">
          {save.error?.message} The page now shows the current rules; choose again and save.
        </Alert>
      ) : save.error ? (
        <ErrorMessage error={save.error} />
      ) : null}
      {save.isSuccess && save.data.version === initial.version && !changed ? (
        <Alert tone="success">Saved. New designs use this rule.</Alert>
      ) : null}
      <div className="flex items-center gap-3">
        <Button type="submit" busy={save.isPending} disabled={!changed}>
          Save design rules
        </Button>
        <span className="text-sm text-sand-600">Version {initial.version}</span>
      </div>
    </form>
  );
}

/** The plant manager's design rules: the engine options every design of the plant uses. */
export function DesignRulesPage() {
  const query = useDesignRules();
  // Kept here: a save (or a 409's reload) brings a new version, which starts the form afresh.
  const save = useSaveDesignRules();
  return (
    <div>
      <PageHeader
        title="Design rules"
        description="How strictly the engine checks every truss the plant designs."
      />
      <QueryState query={query} what="the design rules">
        {(rules) => <RulesForm key={rules.version} initial={rules} save={save} />}
      </QueryState>
    </div>
  );
}
