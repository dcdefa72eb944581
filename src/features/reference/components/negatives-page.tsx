import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { NEGATIVE_KINDS } from '@shared/domain/vocabulary';
import { NegativeSchema } from '@shared/schemas/reference';
import type { NegativeView } from '@shared/types/catalogue';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';
import { referenceQueries } from '@/lib/reference-api';
import { useCan } from '@/lib/session';
import { ReferenceManager } from '@/components/layout/reference-manager';

export function NegativesPage() {
  const negatives = useQuery(referenceQueries.negatives());
  const can = useCan();
  return (
    <>
      <PageHeader title="Negatives" eyebrow="Catalogue" />
      <ReferenceManager<NegativeView>
        path="/negatives"
        noun="negative"
        list={negatives}
        canEdit={can('reference:write')}
        schema={NegativeSchema}
        toForm={(negative) => negative}
        columns={[
          {
            label: 'Code',
            render: (n) => (
              <Link to={paths.negative(n.id)} className="font-mono text-xs whitespace-nowrap">
                {n.code}
              </Link>
            ),
          },
          { label: 'Kind', render: (n) => n.kind },
          { label: 'Format', render: (n) => n.format ?? '—' },
          { label: 'Subject', render: (n) => n.subject ?? '—' },
          {
            label: 'Density range',
            render: (n) => (n.densityRange != null ? n.densityRange.toFixed(2) : '—'),
          },
        ]}
        fields={[
          { name: 'code', label: 'Code' },
          {
            name: 'kind',
            label: 'Kind',
            kind: 'select',
            options: NEGATIVE_KINDS.map((k) => ({ value: k, label: k })),
          },
          { name: 'format', label: 'Format' },
          { name: 'subject', label: 'Subject' },
          { name: 'densityRange', label: 'Density range (Dmax − Dmin)', kind: 'number' },
          { name: 'notes', label: 'Notes' },
        ]}
      />
    </>
  );
}
