import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { LocationSchema } from '@shared/schemas/reference';
import type { LocationView } from '@shared/types/catalogue';
import { isForbidden, NoAccess } from '@/components/ui/no-access';
import { PageHeader } from '@/components/ui/page-header';
import { referenceQueries } from '@/lib/reference-api';
import { useCan } from '@/lib/session';
import { ReferenceManager } from '@/components/layout/reference-manager';

const byPath = (a: LocationView, b: LocationView) => a.path.localeCompare(b.path);

/** Depth of a place in the tree, from its full path. */
const depthOf = (place: LocationView) => place.path.split(' › ').length - 1;

export function PlacesPage() {
  const can = useCan();
  const places = useQuery({ ...referenceQueries.locations(), enabled: can('locations:read') });
  const sorted = [...(places.data ?? [])].sort(byPath);
  if (!can('locations:read') || isForbidden(places.error)) {
    return (
      <>
        <PageHeader title="Places" eyebrow="Where the prints are kept" />
        <NoAccess area="Places" needs="locations:read" />
      </>
    );
  }
  return (
    <>
      <PageHeader title="Places" eyebrow="Where the prints are kept" />
      <p className="mb-4 max-w-prose text-sm text-ink-soft">
        Rooms hold cabinets, cabinets hold drawers and boxes. Places are shown to curators and
        above, never to viewers.
      </p>
      <ReferenceManager<LocationView>
        path="/locations"
        noun="place"
        list={places}
        order={byPath}
        canEdit={can('reference:write')}
        schema={LocationSchema}
        toForm={(place) => place}
        columns={[
          {
            label: 'Place',
            render: (place) => (
              <span
                style={{ paddingLeft: `${depthOf(place) * 1.25}rem` }}
                className="font-serif text-base"
              >
                {depthOf(place) > 0 && (
                  <span aria-hidden="true" className="text-ink-faint">
                    └{' '}
                  </span>
                )}
                <Link to={paths.place(place.id)}>{place.name}</Link>
              </span>
            ),
          },
          {
            label: 'Code',
            render: (place) => <span className="font-mono text-xs">{place.code}</span>,
          },
          { label: 'Full name', render: (place) => place.path },
        ]}
        fields={[
          { name: 'code', label: 'Code' },
          { name: 'name', label: 'Name' },
          {
            name: 'parentId',
            label: 'Inside',
            kind: 'select',
            placeholder: 'Nothing (a top-level place)',
            options: sorted.map((place) => ({ value: place.id, label: place.path })),
          },
          { name: 'notes', label: 'Notes' },
        ]}
      />
    </>
  );
}
