import { useNavigate } from 'react-router-dom';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { ParameterField } from '../../shared/components/ParameterField';
import { SelectField } from '../../shared/components/SelectField';
import { useCurrentWorkspace } from '../../shared/lib/currentWorkspace';
import { useDraftForm, type Built } from '../../shared/lib/draftForm';
import { draftOf, readNumber, type NumberDraft } from '../../shared/lib/parameterDraft';
import { useLaunch } from './api';

type Choice = { strategyId: string; label: string };
type Draft = { strategyId: string; year: NumberDraft };
type Body = { strategyId: string; year: number };

function build(draft: Draft): Built<Body> {
  const year = readNumber('letItSeedYear', draft.year);
  if (year.error) return { body: null, errors: { year: year.error } };
  return { body: { strategyId: draft.strategyId, year: year.value! }, errors: {} };
}

/** The server names the launch body's fields ("letItSeed.year"); the form names its own. */
const fromServer = (fields: Record<string, string>) => {
  const errors: Record<string, string> = {};
  if (fields['letItSeed.year']) errors.year = fields['letItSeed.year'];
  if (fields['letItSeed.strategyId']) errors.strategyId = fields['letItSeed.strategyId'];
  return errors;
};

/**
 * Launches the scenario again with a let-it-seed variant of one strategy, with the seed
 * of the launch it was opened from so the new numbers line up with the old ones. A year
 * after the horizon is refused by the server, with the message beside the field.
 */
export function LetItSeedForm({
  scenarioId,
  seed,
  horizon,
  strategies,
  initial,
}: {
  scenarioId: string;
  seed: number;
  horizon: number;
  strategies: readonly Choice[];
  initial?: { strategyId: string; year: number };
}) {
  const workspace = useCurrentWorkspace();
  const navigate = useNavigate();
  const launch = useLaunch(workspace.id);
  const form = useDraftForm<Draft, Body>(
    {
      strategyId: initial?.strategyId ?? strategies[0]?.strategyId ?? '',
      year: draftOf(initial?.year ?? Math.min(3, horizon)),
    },
    build,
    fromServer,
  );
  const { draft, edit, errorAt, formRef } = form;

  return (
    <form
      ref={formRef}
      noValidate
      aria-label="Price a year of letting it seed"
      onSubmit={(event) => {
        event.preventDefault();
        if (launch.isPending) return;
        void form.submit(async (body) => {
          const launched = await launch.mutateAsync({ scenarioId, body: { seed, letItSeed: body } });
          navigate(`/w/${workspace.id}/batches/${launched.batchId}/let-it-seed`);
        });
      }}
      className="flex flex-col gap-4"
    >
      <div className="max-w-md">
        <SelectField
          label="Strategy"
          name="strategyId"
          hint="The strategy to run again with one year of seed set allowed."
          value={draft.strategyId}
          error={errorAt('strategyId')}
          onChange={(event) => {
            const value = event.target.value;
            edit('strategyId', (d) => ({ ...d, strategyId: value }));
          }}
          options={strategies.map((s) => ({ value: s.strategyId, label: s.label }))}
        />
      </div>
      <ParameterField
        parameter="letItSeedYear"
        draft={draft.year}
        onChange={(value) => edit('year', (d) => ({ ...d, year: value }))}
        error={errorAt('year')}
        meaning={`A year from 1 to ${horizon} in which the strategy’s seed-set steps (mowing, seed-head removal) do not happen, to price one year of letting the weed seed.`}
      />
      <p className="max-w-prose text-sm text-loam-700">
        This launches the whole scenario again with seed {seed} — every strategy, No control and the
        let-it-seed variant — so the two runs of the strategy can be set side by side.
      </p>
      <FormAlert error={launch.error} />
      <div>
        <Button type="submit" pending={launch.isPending} pendingLabel="Launching…">
          Run the let-it-seed comparison
        </Button>
      </div>
    </form>
  );
}
