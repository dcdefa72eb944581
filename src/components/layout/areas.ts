import type { Ability } from '@shared/domain/roles';
import { paths } from '@/config/paths';

export interface Area {
  to: string;
  label: string;
  needs: Ability;
}

export interface AreaGroup {
  heading: string;
  areas: Area[];
}

/**
 * The areas under four headings of our own, by the job they serve; each person sees the
 * headings and areas their role may use (only areas that work today are listed).
 */
export const AREA_GROUPS: AreaGroup[] = [
  {
    heading: 'Collection',
    areas: [
      { to: paths.prints, label: 'Prints', needs: 'catalogue:read' },
      { to: paths.search, label: 'Search', needs: 'catalogue:read' },
      { to: paths.checklists, label: 'Checklists', needs: 'searches:save' },
      { to: paths.places, label: 'Places', needs: 'locations:read' },
      { to: paths.loans, label: 'Loans and shows', needs: 'catalogue:read' },
      { to: paths.sources, label: 'Sources', needs: 'sources:read' },
      { to: paths.imports, label: 'Imports', needs: 'imports:write' },
    ],
  },
  {
    heading: 'Conservation',
    areas: [
      { to: paths.toneWatch, label: 'Tone watch', needs: 'tone:write' },
      { to: paths.toneRounds, label: 'Check round', needs: 'tone:write' },
      { to: paths.insights, label: 'Insights', needs: 'catalogue:read' },
      { to: paths.settings, label: 'Settings', needs: 'settings:read' },
    ],
  },
  {
    heading: 'Darkroom',
    areas: [
      { to: paths.chemistry, label: 'Chemistry', needs: 'catalogue:read' },
      { to: paths.solutionMaker, label: 'Solution maker', needs: 'catalogue:read' },
      { to: paths.papers, label: 'Papers', needs: 'catalogue:read' },
      { to: paths.negatives, label: 'Negatives', needs: 'catalogue:read' },
    ],
  },
  {
    heading: 'Administration',
    areas: [
      { to: paths.people, label: 'People', needs: 'users:manage' },
      { to: paths.outbox, label: 'Outbox', needs: 'outbox:read' },
      { to: paths.fixity, label: 'Fixity', needs: 'fixity:run' },
    ],
  },
];

/** The groups a person may use, each with only the areas they may use; empty groups dropped. */
export function groupsFor(abilities: readonly Ability[]): AreaGroup[] {
  return AREA_GROUPS.map((group) => ({
    heading: group.heading,
    areas: group.areas.filter((area) => abilities.includes(area.needs)),
  })).filter((group) => group.areas.length > 0);
}

/** The area a path belongs to: the longest area path that starts it ("/prints/12" → Prints). */
export function currentArea(groups: readonly AreaGroup[], pathname: string): Area | null {
  let best: Area | null = null;
  for (const area of groups.flatMap((group) => group.areas)) {
    const within = pathname === area.to || pathname.startsWith(`${area.to}/`);
    if (within && (!best || area.to.length > best.to.length)) best = area;
  }
  return best;
}
