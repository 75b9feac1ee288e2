import type { ClassCardView, LookAlikeRow } from '../../../../shared/api/species-cards';

type SpeciesCardProps = {
  /** The profile the card describes. */
  name: string;
  card: ClassCardView;
  /** Where the photo with this id is served (a workspace route, or a class link's). */
  photoUrl: (photoId: string) => string;
  headingLevel?: 'h2' | 'h3';
  /** Larger type and no shadows, for a projector. */
  large?: boolean;
};

/** Rows grouped by look-alike, in the order they were entered, so each gets its own table. */
function byLookAlike(rows: readonly LookAlikeRow[]) {
  const groups = new Map<string, LookAlikeRow[]>();
  for (const row of rows) groups.set(row.lookAlikeName, [...(groups.get(row.lookAlikeName) ?? []), row]);
  return [...groups];
}

/**
 * A species card as lessons, profile pages and reports show it: how to tell the species
 * from its look-alikes feature by feature, its life form and status in the words the
 * workspace entered, and its photos with their captions.
 */
export function SpeciesCard({
  name,
  card,
  photoUrl,
  headingLevel: Heading = 'h2',
  large = false,
}: SpeciesCardProps) {
  const Sub = Heading === 'h2' ? 'h3' : 'h4';
  return (
    <section
      aria-label={`Species card: ${name}`}
      className={`flex flex-col gap-4 rounded-seed border border-silt-300 bg-white p-5 break-inside-avoid ${large ? '' : 'shadow-sheet'}`}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <Heading className={large ? 'text-3xl font-semibold' : 'text-2xl font-semibold'}>{name}</Heading>
        <p className="text-xs font-semibold tracking-wide text-russet-700 uppercase">Species card</p>
      </div>
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[auto_minmax(0,1fr)]">
        <dt className="font-medium text-loam-700">Life form</dt>
        <dd className="text-humus-900">{card.lifeForm || '—'}</dd>
        <dt className="font-medium text-loam-700">Status</dt>
        <dd className="text-humus-900">
          {card.status || '—'}
          {card.status ? (
            <span className="text-sm text-loam-700"> (as entered in this workspace)</span>
          ) : null}
        </dd>
      </dl>
      {card.identificationNotes ? (
        <div>
          <Sub className="text-lg font-semibold">How to recognise it</Sub>
          <p className="max-w-prose whitespace-pre-line text-humus-900">{card.identificationNotes}</p>
        </div>
      ) : null}
      {byLookAlike(card.lookAlikes).map(([lookAlike, rows]) => (
        <div key={lookAlike} className="overflow-x-auto">
          <table className="w-full min-w-[28rem] border-collapse text-left">
            <caption className="pb-2 text-left font-display text-lg font-semibold text-humus-900">
              Telling it from {lookAlike}
            </caption>
            <thead>
              <tr className="border-b-2 border-loam-400">
                <th scope="col" className="py-1.5 pr-4 font-semibold">
                  Feature
                </th>
                <th scope="col" className="py-1.5 pr-4 font-semibold">
                  {name}
                </th>
                <th scope="col" className="py-1.5 font-semibold">
                  {lookAlike}
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((row, i) => (
                <tr key={`${row.feature}-${i}`} className="border-b border-silt-200 align-top">
                  <th scope="row" className="py-1.5 pr-4 font-medium text-humus-900">
                    {row.feature}
                  </th>
                  <td className="py-1.5 pr-4">{row.thisSpecies}</td>
                  <td className="py-1.5">{row.lookAlike}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ))}
      {card.photos.length > 0 ? (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
          {card.photos.map((photo) => (
            <li key={photo.id}>
              <figure className="flex flex-col gap-1">
                <img
                  src={photoUrl(photo.id)}
                  alt={photo.caption}
                  width={photo.width}
                  height={photo.height}
                  loading="lazy"
                  className="aspect-[4/3] w-full rounded-seed border border-silt-300 object-cover"
                />
                <figcaption className="text-sm text-loam-700">{photo.caption}</figcaption>
              </figure>
            </li>
          ))}
        </ul>
      ) : null}
    </section>
  );
}
