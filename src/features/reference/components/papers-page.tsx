import { useQuery } from '@tanstack/react-query';
import { PaperSchema } from '@shared/schemas/reference';
import type { PaperView } from '@shared/types/catalogue';
import { PageHeader } from '@/components/ui/page-header';
import { referenceQueries } from '@/lib/reference-api';
import { useCan } from '@/lib/session';
import { ReferenceManager } from '@/components/layout/reference-manager';

export function PapersPage() {
  const papers = useQuery(referenceQueries.papers());
  const can = useCan();
  return (
    <>
      <PageHeader title="Papers" eyebrow="Catalogue" />
      <ReferenceManager<PaperView>
        path="/papers"
        noun="paper"
        list={papers}
        canEdit={can('reference:write')}
        schema={PaperSchema}
        toForm={(paper) => paper}
        columns={[
          {
            label: 'Name',
            render: (p) => <span className="font-serif text-base">{p.name}</span>,
          },
          { label: 'Fibre', render: (p) => p.fibre ?? '—' },
          { label: 'Weight', render: (p) => (p.weightGsm ? `${p.weightGsm} g/m²` : '—') },
          { label: 'Surface', render: (p) => p.surface ?? '—' },
          { label: 'Sizing', render: (p) => p.sizing ?? '—' },
        ]}
        fields={[
          { name: 'name', label: 'Name' },
          { name: 'manufacturer', label: 'Maker of the paper' },
          { name: 'fibre', label: 'Fibre' },
          { name: 'weightGsm', label: 'Weight (g/m²)', kind: 'number' },
          { name: 'surface', label: 'Surface' },
          { name: 'sizing', label: 'Sizing' },
          { name: 'notes', label: 'Notes' },
        ]}
      />
    </>
  );
}
