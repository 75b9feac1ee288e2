import { Link } from 'react-router-dom';

/** A source note with its "Records: /w/…/records" address as a link to the records page. */
export function NoteText({ note }: { note: string }) {
  const match = /(Records: )(\/w\/[0-9a-f-]{36}\/fields\/[0-9a-f-]{36}\/records)/.exec(note);
  if (!match) return <>{note}</>;
  const before = note.slice(0, match.index);
  const after = note.slice(match.index + match[0].length);
  return (
    <>
      {before}
      {match[1]}
      <Link to={match[2]} className="text-russet-700 underline underline-offset-4 hover:text-russet-800">
        {match[2]}
      </Link>
      {after}
    </>
  );
}
