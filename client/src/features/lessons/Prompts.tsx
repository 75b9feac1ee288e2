/** The teacher's prompts and questions. Their HTML was rendered from Markdown and sanitised by the server. */
export function Prompts({
  prompts,
  large = false,
  handout = false,
}: {
  prompts: readonly { html: string }[];
  large?: boolean;
  handout?: boolean;
}) {
  if (prompts.length === 0) return null;
  return (
    <section aria-labelledby="prompts-title" className="flex flex-col gap-3 break-inside-avoid">
      <h2 id="prompts-title" className={large ? 'text-4xl font-semibold' : 'text-2xl font-semibold'}>
        Questions for the class
      </h2>
      <ol className={`flex list-decimal flex-col gap-3 pl-6 ${large ? 'text-2xl' : 'text-lg'}`}>
        {prompts.map((p, i) => (
          <li key={i} className="pl-1">
            <div
              className="flex max-w-prose flex-col gap-2 [&_a]:text-russet-700 [&_a]:underline [&_code]:font-mono [&_h3]:font-semibold [&_ol]:list-decimal [&_ol]:pl-6 [&_ul]:list-disc [&_ul]:pl-6"
              dangerouslySetInnerHTML={{ __html: p.html }}
            />
            {handout ? (
              <div className="mt-2 h-24 border-b border-dashed border-loam-400" aria-hidden="true" />
            ) : null}
          </li>
        ))}
      </ol>
    </section>
  );
}
