import { useQuery } from '@tanstack/react-query';
import { formatCount } from '@shared/domain/format';
import type { SourceView } from '@shared/types/registrar';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { SourceEditor } from '@/components/catalogue/source-editor';
import { Button } from '@/components/ui/button';
import { NoAccess } from '@/components/ui/no-access';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { useCan } from '@/lib/session';
import { sourceQueries } from '@/lib/sources-api';

const KIND_WORDS: Record<SourceView['kind'], string> = {
  person: 'person',
  organisation: 'organisation',
};

/** Donors, sellers and lenders, each with the way to its prints; archivists add and edit. */
export function SourcesPage() {
  const can = useCan();
  if (!can('sources:read')) {
    return (
      <>
        <PageHeader title="Sources" eyebrow="Where prints came from" />
        <NoAccess area="Sources" needs="sources:read" />
      </>
    );
  }
  return <SourcesList canWrite={can('sources:write')} />;
}

function SourcesList({ canWrite }: { canWrite: boolean }) {
  const sources = useQuery(sourceQueries.list());
  const [adding, setAdding] = useState(false);
  const [editing, setEditing] = useState<number | null>(null);
  const [saved, setSaved] = useState('');
  const done = (words: string) => {
    setAdding(false);
    setEditing(null);
    setSaved(words);
  };
  return (
    <>
      <PageHeader
        title="Sources"
        eyebrow="Where prints came from"
        actions={
          canWrite &&
          !adding && (
            <Button tone="primary" onClick={() => setAdding(true)}>
              Add a source
            </Button>
          )
        }
      />
      <p role="status" className="mb-3 text-sm text-ink-soft">
        {saved}
      </p>
      {adding && (
        <div className="mb-6 max-w-2xl">
          <SourceEditor
            label="New source"
            onSaved={(source) => done(`${source.name} added.`)}
            onCancel={() => setAdding(false)}
          />
        </div>
      )}
      {sources.error ? (
        <ErrorNotice error={sources.error} />
      ) : !sources.data ? (
        <Loading label="Loading sources…" />
      ) : sources.data.length === 0 ? (
        <p className="text-sm text-ink-soft">No sources yet.</p>
      ) : (
        <table className="w-full text-sm">
          <thead>
            <tr className="text-left text-ink-soft">
              <th scope="col">Name</th>
              <th scope="col">Kind</th>
              {canWrite && <th scope="col">Contact</th>}
              <th scope="col">Prints</th>
              {canWrite && <th scope="col">Change</th>}
            </tr>
          </thead>
          <tbody>
            {sources.data.map((source) =>
              editing === source.id ? (
                <tr key={source.id} className="border-t border-paper-edge">
                  <td colSpan={5} className="py-2">
                    <SourceEditor
                      source={source}
                      label={`Edit ${source.name}`}
                      onSaved={(changed) => done(`${changed.name} saved.`)}
                      onCancel={() => setEditing(null)}
                    />
                  </td>
                </tr>
              ) : (
                <tr key={source.id} className="border-t border-paper-edge align-top">
                  <td className="py-1.5 font-medium">{source.name}</td>
                  <td className="py-1.5">{KIND_WORDS[source.kind]}</td>
                  {canWrite && (
                    <td className="py-1.5 whitespace-pre-line">{source.contact ?? '—'}</td>
                  )}
                  <td className="py-1.5">
                    {source.prints > 0 ? (
                      <Link to={`${paths.search}?sourceId=${source.id}`}>
                        {formatCount(source.prints, 'print')} from this source
                      </Link>
                    ) : (
                      'none yet'
                    )}
                  </td>
                  {canWrite && (
                    <td className="py-1.5">
                      <Button onClick={() => setEditing(source.id)}>
                        Edit<span className="sr-only"> {source.name}</span>
                      </Button>
                    </td>
                  )}
                </tr>
              ),
            )}
          </tbody>
        </table>
      )}
    </>
  );
}
