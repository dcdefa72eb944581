import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { paths } from '@/config/paths';

export function NotFoundPage() {
  return (
    <>
      <PageHeader title="No such page" />
      <p className="mb-4 text-sm">The address does not lead to anything in Printwarden.</p>
      <ButtonLink to={paths.prints}>Back to the prints</ButtonLink>
    </>
  );
}
