import { roleCan, ROLES, type Ability, type Role } from '@shared/domain/roles';
import { ApiError } from '@/lib/api-client';
import { useSession } from '@/lib/session';
import { ButtonLink } from './button';
import { paths } from '@/config/paths';

/** What each role may do, in the words the people page and this notice share. */
export const ROLE_SUMMARIES: Record<Role, string> = {
  viewer:
    'read catalogue records, see images at web size and each print’s tone status, search the catalogue and use the solution maker',
  curator:
    'everything a viewer can, plus places, original files, saved searches, checklists and exports, and the title, description and tags of prints',
  conservator:
    'everything a curator can, plus tone checks, condition reports, treatments, alerts and check schedules',
  archivist:
    'everything a curator can, plus creating and editing prints with their processing history and images, papers, negatives, solution batches, places and imports',
  admin: 'everything, including people, invitations and settings',
};

/**
 * "As a curator you can do everything a viewer can, plus …": the sentence the notice tells a
 * role about itself. The summaries read after "may" or "can do" alike, so the verb is added
 * here when a summary starts with "everything".
 */
export function roleCanSentence(role: Role): string {
  const article = role === 'admin' || role === 'archivist' ? 'an' : 'a';
  const summary = ROLE_SUMMARIES[role];
  const verb = summary.startsWith('everything') ? 'can do' : 'can';
  return `As ${article} ${role} you ${verb} ${summary}.`;
}

/** True for the server's "signed in, but not allowed" answer. */
export function isForbidden(error: unknown): boolean {
  return error instanceof ApiError && error.status === 403;
}

/** The roles that carry an ability, in words: "conservators and admins". */
export function rolesWith(ability: Ability): string {
  // Made when first needed: see the Intl rule in eslint.config.js.
  const andList = new Intl.ListFormat('en-GB', { type: 'conjunction', style: 'long' });
  return andList.format(ROLES.filter((role) => roleCan(role, ability)).map((role) => `${role}s`));
}

/**
 * One plain page for an area the signed-in role may not open: what the area is for, who may
 * open it (the roles that carry `needs`, read from the role table), and what this role can
 * do instead. Never an error code beside an empty list.
 */
export function NoAccess({ area, needs }: { area: string; needs: Ability }) {
  const forWhom = rolesWith(needs);
  const { data: session } = useSession();
  const role = session?.user.role as Role | undefined;
  return (
    <section
      aria-labelledby="no-access-heading"
      className="max-w-prose rounded border border-paper-edge bg-white/60 p-4"
    >
      <h2 id="no-access-heading" className="font-serif text-xl">
        {area} are not open to your role
      </h2>
      <p className="mt-2 text-sm text-ink-soft">
        {area} are for {forWhom}.{role && <> {roleCanSentence(role)}</>} An admin can change your
        role on the People page.
      </p>
      <div className="mt-3 flex flex-wrap gap-2">
        <ButtonLink to={paths.prints}>Go to Prints</ButtonLink>
        <ButtonLink to={paths.search}>Search the catalogue</ButtonLink>
      </div>
    </section>
  );
}
