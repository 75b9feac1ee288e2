import { useId, useState } from 'react';
import { Button } from '../../shared/components/Button';
import { FormAlert } from '../../shared/components/FormAlert';
import { TextField } from '../../shared/components/TextField';
import { serverFieldErrors } from '../../shared/lib/forms';
import { useUploadPhoto } from './api';

/**
 * Adds a photo to the card: JPEG or PNG up to 5 MB, with a caption that is read out in
 * place of the picture. The server checks the file itself, shrinks it to 1600 px and
 * removes its metadata (camera, time, location) before keeping it.
 */
export function PhotoUpload({ workspaceId, profileId }: { workspaceId: string; profileId: string }) {
  const upload = useUploadPhoto(workspaceId, profileId);
  const [file, setFile] = useState<File | null>(null);
  const [caption, setCaption] = useState('');
  const [inputKey, setInputKey] = useState(0);
  const id = useId();
  const fields = serverFieldErrors(upload.error);
  return (
    <form
      className="flex flex-col gap-3 rounded-seed border border-dashed border-loam-400 p-4"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        if (!file) return;
        upload.mutate(
          { file, caption },
          {
            onSuccess: () => {
              setFile(null);
              setCaption('');
              setInputKey((k) => k + 1);
            },
          },
        );
      }}
    >
      <p className="font-display text-lg font-semibold">Add a photo</p>
      <div className="flex flex-col gap-1.5">
        <label htmlFor={id} className="font-medium text-humus-900">
          Photo (JPEG or PNG, at most 5 MB)
        </label>
        <input
          key={inputKey}
          id={id}
          type="file"
          accept="image/jpeg,image/png"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          aria-invalid={fields.photo !== undefined}
          aria-describedby={fields.photo ? `${id}-error` : undefined}
          className="text-sm file:mr-3 file:rounded-seed file:border file:border-loam-400 file:bg-silt-50 file:px-3 file:py-1.5"
        />
        {fields.photo ? (
          <p id={`${id}-error`} className="text-sm font-medium text-danger-700">
            {fields.photo}
          </p>
        ) : null}
      </div>
      <TextField
        label="Caption"
        name="caption"
        required
        value={caption}
        onChange={(e) => setCaption(e.target.value)}
        hint="What the photo shows, e.g. “Rosette in April, broad leaves with flat margins”."
        error={fields.caption}
      />
      <FormAlert error={upload.error} />
      <div>
        <Button
          type="submit"
          variant="secondary"
          pending={upload.isPending}
          pendingLabel="Uploading…"
          disabled={!file}
        >
          Upload the photo
        </Button>
      </div>
    </form>
  );
}
