/** The thin banded edge under the header and above the footer: humus, loam, clay, as seen in a core. */
export function HorizonRule({ className = '' }: { className?: string }) {
  return <div className={`h-2 w-full bg-horizon ${className}`} aria-hidden="true" />;
}
