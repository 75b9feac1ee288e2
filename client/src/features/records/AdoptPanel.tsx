import { useEffect, useId, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import type { Adoptable, AdoptionView, AdoptTarget } from '../../../../shared/api/records';
import type { ProfileView } from '../../../../shared/api/profiles';
import type { StrategyView } from '../../../../shared/api/strategies';
import { adoptedNote, AGE_CLASS, seedbankFromLayers } from '../../../../shared/records/adopt-notes';
import { parameterCatalogue } from '../../../../shared/scenario/parameters';
import type { Efficacy, SpeciesProfile } from '../../../../models/scenario/types';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { PesticideCautions } from '../../shared/components/PesticideCautions';
import { SelectField } from '../../shared/components/SelectField';
import { useAdopt } from './api';
import { fmt, useRecordUnits } from './format';
import { NoteText } from './NoteText';

export type AdoptField = { id: string; name: string; initialSeedbank: { shallow: number; deep: number } };

type Props = {
  estimate: Adoptable;
  workspaceId: string;
  field: AdoptField;
  profiles: readonly ProfileView[];
  strategies: readonly StrategyView[];
  /** Copies a built-in profile so the estimate can go into the copy. */
  copyProfile: (profileId: string) => Promise<ProfileView>;
  /** Told which target changed, so the pages showing it read it again. */
  onAdopted: (target: AdoptTarget['kind'], adoption: AdoptionView) => void;
  onClose: () => void;
};

function parameterLabel(parameter: string): string {
  const age = AGE_CLASS.exec(parameter);
  if (age) return `Germination, shallow layer, seed age class ${age[1]}`;
  const entry = (parameterCatalogue as Record<string, { label: string }>)[`profile.${parameter}`];
  return entry?.label ?? parameter;
}

function parameterUnit(parameter: string): string {
  const key = AGE_CLASS.test(parameter) ? 'profile.germination.shallowByAge[]' : `profile.${parameter}`;
  return (parameterCatalogue as Record<string, { unit: string }>)[key]?.unit ?? '';
}

function readParameter(profile: SpeciesProfile, parameter: string): number | undefined {
  const age = AGE_CLASS.exec(parameter);
  if (age) {
    const list = profile.germination.shallowByAge;
    return list[Math.min(Number(age[1]), list.length - 1)];
  }
  const [a, b] = parameter.split('.');
  const top = (profile as unknown as Record<string, unknown>)[a];
  const value = b === undefined ? top : (top as Record<string, unknown> | undefined)?.[b];
  return typeof value === 'number' ? value : undefined;
}

/** The parameters offered: germination by age expands to every age class of the chosen profile. */
function parameterOptions(estimate: Adoptable, profile: ProfileView | undefined): string[] {
  return estimate.parameters.flatMap((p) =>
    AGE_CLASS.test(p)
      ? Array.from({ length: profile?.profile.ageClasses ?? 1 }, (_, i) => `germination.shallowByAge[${i}]`)
      : [p],
  );
}

/** The first step whose active ingredient the estimate's label names, else the first step of the first strategy. */
function matchingStep(strategies: readonly StrategyView[], label: string): [string, number] {
  const named = label.toLowerCase();
  for (const s of strategies) {
    const i = s.strategy.steps.findIndex((step) => {
      const ingredient = 'chemical' in step ? step.chemical?.activeIngredient.toLowerCase() : undefined;
      return ingredient !== undefined && ingredient !== '' && named.includes(ingredient);
    });
    if (i >= 0) return [s.id, i];
  }
  return [strategies[0]?.id ?? '', 0];
}

const efficacyText = (e: Efficacy) =>
  'mean' in e
    ? `mean ${fmt(e.mean)}, SD ${fmt(e.sd)}`
    : `min ${fmt(e.min)}, mode ${fmt(e.mode)}, max ${fmt(e.max)}`;

/**
 * Adopting one estimate: pick the target, read exactly what will change and the source note
 * it will carry, then confirm. A built-in profile is copied first (it is read-only), and the
 * panel says so before anything happens.
 */
export function AdoptPanel({
  estimate,
  workspaceId,
  field,
  profiles,
  strategies,
  copyProfile,
  onAdopted,
  onClose,
}: Props) {
  const headingRef = useRef<HTMLHeadingElement>(null);
  const headingId = useId();
  const units = useRecordUnits();
  const adopt = useAdopt(workspaceId, field.id);
  const [copying, setCopying] = useState(false);
  const [copyError, setCopyError] = useState<unknown>(null);
  const [done, setDone] = useState<AdoptionView | null>(null);

  const own = profiles.filter((p) => !p.builtIn);
  const [profileId, setProfileId] = useState((own[0] ?? profiles[0])?.id ?? '');
  const profile = profiles.find((p) => p.id === profileId);
  const options = parameterOptions(estimate, profile);
  const [parameterChoice, setParameter] = useState(estimate.parameters[0] ?? '');
  const parameter = options.includes(parameterChoice) ? parameterChoice : (options[0] ?? '');

  // This field's strategies first; the step preselected is one whose active ingredient the estimate names.
  const withSteps = [...strategies]
    .filter((s) => s.strategy.steps.length > 0)
    .sort((a, b) => Number(b.fieldId === field.id) - Number(a.fieldId === field.id));
  const [initialStrategy, initialStep] = matchingStep(withSteps, estimate.label);
  const [strategyId, setStrategyId] = useState(initialStrategy);
  const strategy = withSteps.find((s) => s.id === strategyId);
  const [stepChoice, setStep] = useState(initialStep);
  const stepIndex = strategy && stepChoice < strategy.strategy.steps.length ? stepChoice : 0;
  const step = strategy?.strategy.steps[stepIndex];

  const layers = estimate.layers ?? [];
  const [sides, setSides] = useState<Record<string, 'shallow' | 'deep' | 'none'>>(() =>
    Object.fromEntries(layers.map((l, i) => [l.layer, i === 0 ? 'shallow' : 'deep'])),
  );

  useEffect(() => headingRef.current?.focus(), []);

  const target: AdoptTarget | null =
    estimate.target === 'profile'
      ? profile && parameter
        ? { kind: 'profile', profileId: profile.id, parameter }
        : null
      : estimate.target === 'step'
        ? strategy && step
          ? { kind: 'step', strategyId: strategy.id, stepIndex }
          : null
        : {
            kind: 'field-seedbank',
            shallowLayers: layers.filter((l) => sides[l.layer] === 'shallow').map((l) => l.layer),
            deepLayers: layers.filter((l) => sides[l.layer] === 'deep').map((l) => l.layer),
          };
  const note = target ? adoptedNote(estimate, target, field.initialSeedbank) : '';
  const builtIn = estimate.target === 'profile' && profile?.builtIn === true;
  const seedbankText = (v: { shallow: number; deep: number }) =>
    `shallow ${fmt(units.density(v.shallow))}, deep ${fmt(units.density(v.deep))} seeds/${units.per}`;

  let change: string | null = null;
  if (target?.kind === 'profile' && profile && estimate.fraction !== null) {
    const old = readParameter(profile.profile, target.parameter);
    change = `Set “${parameterLabel(target.parameter)}” of “${profile.name}” from ${old === undefined ? '—' : fmt(old)} to ${fmt(estimate.fraction)} (${parameterUnit(target.parameter)}).`;
  } else if (target?.kind === 'step' && strategy && step && estimate.efficacy) {
    change = `Set the efficacy of step ${stepIndex + 1} “${step.label}” in “${strategy.name}” from ${efficacyText(step.efficacy)} to ${efficacyText(estimate.efficacy)}.`;
  } else if (target?.kind === 'field-seedbank') {
    const next = seedbankFromLayers(layers, target, field.initialSeedbank);
    change =
      target.shallowLayers.length + target.deepLayers.length === 0
        ? null
        : `Set the initial seedbank of “${field.name}” from ${seedbankText(field.initialSeedbank)} to ${seedbankText(next)}.`;
  }

  const confirm = async () => {
    if (!target || adopt.isPending || copying) return;
    let chosen = target;
    if (builtIn && target.kind === 'profile') {
      setCopying(true);
      setCopyError(null);
      try {
        const copy = await copyProfile(target.profileId);
        chosen = { ...target, profileId: copy.id };
        setProfileId(copy.id);
      } catch (error) {
        setCopyError(error);
        return;
      } finally {
        setCopying(false);
      }
    }
    adopt.mutate(
      { estimateKey: estimate.key, target: chosen },
      {
        onSuccess: (view) => {
          setDone(view);
          onAdopted(chosen.kind, view);
        },
      },
    );
  };

  const targetLink =
    done?.targetKind === 'profile'
      ? `/w/${workspaceId}/profiles/${done.targetId}`
      : done?.targetKind === 'step'
        ? `/w/${workspaceId}/strategies/${done.targetId}`
        : `/w/${workspaceId}/fields/${field.id}`;

  return (
    <section
      aria-labelledby={headingId}
      className="flex flex-col gap-4 rounded-seed border-2 border-humus-900 bg-silt-50 p-4 sm:p-5"
    >
      <h4 id={headingId} ref={headingRef} tabIndex={-1} className="text-lg font-semibold focus:outline-none">
        Adopt: {estimate.label}
      </h4>
      {done ? (
        <div role="status" className="flex flex-col gap-3">
          <p className="font-medium text-sprout-800">
            Adopted into {done.targetName}: {done.pathLabel}.
          </p>
          <figure className="flex flex-col gap-1">
            <figcaption className="text-sm font-semibold">Source note recorded</figcaption>
            <blockquote className="border-l-4 border-russet-600 bg-white px-3 py-2 text-sm break-words">
              <NoteText note={done.note} />
            </blockquote>
          </figure>
          <div className="flex flex-wrap gap-3">
            <Link
              to={targetLink}
              className="text-sm font-medium text-russet-700 underline underline-offset-4 hover:text-russet-800"
            >
              Open {done.targetName}
            </Link>
            <Button variant="secondary" size="sm" onClick={onClose}>
              Close
            </Button>
          </div>
        </div>
      ) : (
        <>
          <div className="grid gap-4 md:grid-cols-2">
            {estimate.target === 'profile' ? (
              <>
                <SelectField
                  label="Species profile"
                  name="profile"
                  value={profileId}
                  onChange={(e) => setProfileId(e.target.value)}
                  options={profiles.map((p) => ({
                    value: p.id,
                    label: p.builtIn ? `${p.name} — built-in, copied first` : p.name,
                  }))}
                />
                <SelectField
                  label="Parameter"
                  name="parameter"
                  value={parameter}
                  onChange={(e) => setParameter(e.target.value)}
                  options={options.map((p) => ({ value: p, label: parameterLabel(p) }))}
                />
              </>
            ) : null}
            {estimate.target === 'step' ? (
              withSteps.length === 0 ? (
                <p className="text-loam-700">No strategy with steps in this workspace yet.</p>
              ) : (
                <>
                  <SelectField
                    label="Strategy"
                    name="strategy"
                    value={strategyId}
                    onChange={(e) => {
                      setStrategyId(e.target.value);
                      setStep(0);
                    }}
                    options={withSteps.map((s) => ({ value: s.id, label: s.name }))}
                  />
                  <SelectField
                    label="Step"
                    name="step"
                    value={String(stepIndex)}
                    onChange={(e) => setStep(Number(e.target.value))}
                    options={(strategy?.strategy.steps ?? []).map((s, i) => ({
                      value: String(i),
                      label: `${i + 1}. ${s.label} (now ${efficacyText(s.efficacy)})`,
                    }))}
                  />
                </>
              )
            ) : null}
            {estimate.target === 'field-seedbank' ? (
              <div className="flex flex-col gap-2 md:col-span-2">
                <p className="font-medium">Which layers make the field’s shallow and deep seedbank</p>
                {layers.map((l) => (
                  <fieldset key={l.layer} className="flex flex-wrap items-center gap-x-4 gap-y-1">
                    <legend className="float-left mr-4 min-w-32 font-medium">
                      {l.layer}{' '}
                      <span className="font-normal text-loam-700">
                        {fmt(units.density(l.seedsPerM2))} seeds/{units.per}
                      </span>
                    </legend>
                    {(['shallow', 'deep', 'none'] as const).map((side) => (
                      <label key={side} className="inline-flex items-center gap-1.5 text-sm">
                        <input
                          type="radio"
                          name={`side-${l.layer}`}
                          checked={sides[l.layer] === side}
                          onChange={() => setSides((s) => ({ ...s, [l.layer]: side }))}
                        />
                        {side === 'none' ? 'not used' : side}
                      </label>
                    ))}
                  </fieldset>
                ))}
              </div>
            ) : null}
          </div>
          {builtIn && profile ? (
            <p className="rounded-seed border-l-4 border-clay-600 bg-clay-100 px-3 py-2 text-sm">
              “{profile.name}” is a built-in profile and read-only. Adopting first copies it to a profile of
              your own and sets the value in the copy; the built-in stays as it is.
            </p>
          ) : null}
          {change ? <p className="font-medium">{change}</p> : null}
          {target && change ? (
            <figure className="flex flex-col gap-1">
              <figcaption className="text-sm font-semibold">New source note</figcaption>
              <blockquote className="border-l-4 border-loam-500 bg-white px-3 py-2 text-sm break-words">
                {note}
              </blockquote>
            </figure>
          ) : null}
          {estimate.target === 'step' && step && 'chemical' in step && step.chemical ? (
            <PesticideCautions />
          ) : null}
          <FormAlert error={copyError ?? adopt.error} />
          <div className="flex flex-wrap gap-3">
            <Button
              onClick={() => void confirm()}
              pending={adopt.isPending || copying}
              pendingLabel={copying ? 'Copying the profile…' : 'Adopting…'}
              disabled={!change}
            >
              {builtIn ? 'Copy the profile and adopt' : 'Adopt this estimate'}
            </Button>
            <Button variant="quiet" onClick={onClose}>
              Cancel
            </Button>
          </div>
        </>
      )}
    </section>
  );
}
