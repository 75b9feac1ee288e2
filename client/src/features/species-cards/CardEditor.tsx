import { useState } from 'react';
import type { LookAlikeRow, SpeciesCardBody, SpeciesCardView } from '../../../../shared/api/species-cards';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { TextAreaField } from '../../shared/components/TextAreaField';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors } from '../../shared/lib/forms';

type CardEditorProps = {
  profileName: string;
  initial: SpeciesCardView | null;
  onSave: (body: SpeciesCardBody) => void;
  onCancel: () => void;
  saving: boolean;
  error: unknown;
};

const emptyRow = (lookAlikeName = ''): LookAlikeRow => ({
  feature: '',
  thisSpecies: '',
  lookAlike: '',
  lookAlikeName,
});

/**
 * The card's text: identification notes, life form and status in the workspace's own
 * words, and the look-alikes table, one feature per row.
 */
export function CardEditor({ profileName, initial, onSave, onCancel, saving, error }: CardEditorProps) {
  const [notes, setNotes] = useState(initial?.identificationNotes ?? '');
  const [lifeForm, setLifeForm] = useState(initial?.lifeForm ?? '');
  const [status, setStatus] = useState(initial?.status ?? '');
  const [rows, setRows] = useState<LookAlikeRow[]>(initial?.lookAlikes ?? []);
  const fields = serverFieldErrors(error);
  const setRow = (i: number, patch: Partial<LookAlikeRow>) =>
    setRows((all) => all.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  return (
    <form
      className="flex flex-col gap-4"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        onSave({ identificationNotes: notes, lifeForm, status, lookAlikes: rows });
      }}
    >
      <TextAreaField
        label="How to recognise it"
        name="identificationNotes"
        value={notes}
        rows={4}
        maxLength={5000}
        onChange={(e) => setNotes(e.target.value)}
        error={fields.identificationNotes}
      />
      <div className="grid gap-4 md:grid-cols-2">
        <TextField
          label="Life form"
          name="lifeForm"
          value={lifeForm}
          onChange={(e) => setLifeForm(e.target.value)}
          hint="In your words, e.g. “perennial with a taproot”."
          error={fields.lifeForm}
        />
        <TextField
          label="Native or invasive status"
          name="status"
          value={status}
          onChange={(e) => setStatus(e.target.value)}
          hint="As you record it for your region; Seedwake does not look it up."
          error={fields.status}
        />
      </div>
      <fieldset className="flex flex-col gap-3">
        <legend className="font-display text-lg font-semibold">Look-alikes, feature by feature</legend>
        {rows.map((row, i) => (
          <div key={i} className="grid gap-2 rounded-seed border border-silt-300 p-3 md:grid-cols-4">
            <TextField
              label={`Look-alike, row ${i + 1}`}
              name={`lookAlikeName-${i}`}
              required
              value={row.lookAlikeName}
              onChange={(e) => setRow(i, { lookAlikeName: e.target.value })}
              error={fields[`lookAlikes[${i}].lookAlikeName`]}
            />
            <TextField
              label={`Feature, row ${i + 1}`}
              name={`feature-${i}`}
              required
              value={row.feature}
              onChange={(e) => setRow(i, { feature: e.target.value })}
              error={fields[`lookAlikes[${i}].feature`]}
            />
            <TextField
              label={`${profileName}, row ${i + 1}`}
              name={`thisSpecies-${i}`}
              required
              value={row.thisSpecies}
              onChange={(e) => setRow(i, { thisSpecies: e.target.value })}
              error={fields[`lookAlikes[${i}].thisSpecies`]}
            />
            <TextField
              label={`The look-alike, row ${i + 1}`}
              name={`lookAlike-${i}`}
              required
              value={row.lookAlike}
              onChange={(e) => setRow(i, { lookAlike: e.target.value })}
              error={fields[`lookAlikes[${i}].lookAlike`]}
            />
            <Button
              variant="quiet"
              size="sm"
              className="justify-self-start md:col-span-4"
              onClick={() => setRows((all) => all.filter((_, j) => j !== i))}
            >
              Remove row {i + 1}
            </Button>
          </div>
        ))}
        <Button
          variant="secondary"
          size="sm"
          className="self-start"
          onClick={() => setRows((all) => [...all, emptyRow(all[all.length - 1]?.lookAlikeName)])}
        >
          Add a feature row
        </Button>
      </fieldset>
      <FormAlert error={error} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" pending={saving} pendingLabel="Saving…">
          Save the card
        </Button>
        <Button variant="quiet" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
