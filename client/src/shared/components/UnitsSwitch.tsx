import { unitLabels, unitSystemNames, unitSystems, useUnits } from '../lib/units';

/**
 * Metric or US customary, as a pair of radio buttons: arrow keys move between them and a
 * screen reader announces the group, with no custom keyboard handling to get wrong.
 */
export function UnitsSwitch() {
  const { system, setSystem } = useUnits();
  return (
    <fieldset className="flex items-center gap-2">
      <legend className="sr-only">Units</legend>
      <span className="text-sm text-loam-700" aria-hidden="true">
        Units
      </span>
      <div className="flex rounded-seed border border-silt-300 bg-white p-0.5">
        {unitSystems.map((option) => (
          <label
            key={option}
            title={`${unitSystemNames[option]}: ${unitLabels[option].density}, ${unitLabels[option].area}, ${unitLabels[option].mass}`}
            className="cursor-pointer rounded-[0.25rem] px-2.5 py-1 text-sm font-medium text-loam-700 has-checked:bg-humus-900 has-checked:text-silt-50 has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-clay-600"
          >
            <input
              type="radio"
              name="units"
              value={option}
              checked={system === option}
              onChange={() => setSystem(option)}
              className="sr-only"
            />
            <span aria-hidden="true">{option === 'metric' ? 'Metric' : 'US'}</span>
            <span className="sr-only">{unitSystemNames[option]}</span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
