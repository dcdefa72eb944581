import type { PrintView } from '@shared/types/catalogue';

/** Where this record lives in open formats, for other systems (and people) to take it away. */
export function OpenFormats({ print }: { print: PrintView }) {
  return (
    <p className="mt-6 text-sm text-ink-soft print:hidden">
      This record in open formats:{' '}
      <a href={`/api/prints/${print.id}.jsonld`} type="application/ld+json" className="underline">
        JSON-LD (schema.org, Dublin Core)
      </a>
    </p>
  );
}
