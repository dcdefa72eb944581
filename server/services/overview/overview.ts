import { statfs } from 'node:fs/promises';
import type { Sequelize } from 'sequelize';
import type { Role } from '../../../shared/domain/roles';
import type { OverviewItem, OverviewResponse } from '../../../shared/types/overview';
import { OverviewCounts } from '../../repositories/overview-repository';

const DAY = 86_400_000;
/** "Recent" on the start page: the last thirty days (our choice). */
const RECENT_DAYS = 30;

const isoDay = (date: Date) => date.toISOString().slice(0, 10);

/** Bytes in the units people read (1 kB = 1000 bytes, as disks are sold). */
export function readableBytes(bytes: number): string {
  const units = ['bytes', 'kB', 'MB', 'GB', 'TB'];
  let value = bytes;
  let unit = 0;
  while (value >= 1000 && unit < units.length - 1) {
    value /= 1000;
    unit += 1;
  }
  return `${unit === 0 ? value : value.toFixed(1)} ${units[unit]}`;
}

export interface OverviewAsker {
  id: number;
  role: Role;
  /** Tone status changes up to here are marked seen; null: never marked. */
  toneChangesSeenAt: Date | null;
}

interface OverviewContext {
  sequelize: Sequelize;
  /** The disk that holds the originals; null when they live in object storage. */
  uploadsDir: string | null;
  now?: Date;
}

/** The start page's summary for one person, by their role. */
export async function overviewFor(
  asker: OverviewAsker,
  context: OverviewContext,
): Promise<OverviewResponse> {
  const counts = new OverviewCounts(context.sequelize);
  const now = context.now ?? new Date();
  const build = SUMMARIES[asker.role];
  return { role: asker.role, items: await build(counts, asker, now, context) };
}

type Summary = (
  counts: OverviewCounts,
  asker: OverviewAsker,
  now: Date,
  context: OverviewContext,
) => Promise<OverviewItem[]>;

const recentSince = (now: Date) => new Date(now.getTime() - RECENT_DAYS * DAY);

const conservator: Summary = async (counts, asker, now) => {
  const today = isoDay(now);
  const weekEnd = isoDay(new Date(now.getTime() + 6 * DAY));
  const since = asker.toneChangesSeenAt ?? recentSince(now);
  const sinceWords = asker.toneChangesSeenAt
    ? 'since you last marked them seen'
    : `in the last ${RECENT_DAYS} days`;
  return [
    {
      kind: 'checks-due',
      count: await counts.checksDue(today, weekEnd),
      // The round it opens also lists the overdue prints (its first line says so); this count
      // is the week's own, and the overdue are the next item's.
      label: `Tone checks falling due this week (to ${weekEnd}), not yet overdue`,
      href: `/tone-watch/rounds?from=${today}&to=${weekEnd}`,
    },
    {
      kind: 'checks-overdue',
      count: await counts.checksOverdue(today),
      label: 'Tone checks overdue',
      href: `/tone-watch/rounds?from=${today}&to=${today}`,
    },
    {
      kind: 'open-alerts',
      count: await counts.openAlerts(),
      label: 'Alerts not yet acknowledged',
      href: '/tone-watch',
    },
    {
      kind: 'place-alerts',
      count: await counts.openPlaceAlerts(),
      label: 'Places outside their storage band, not yet acknowledged',
      href: '/tone-watch#place-alerts',
    },
    {
      kind: 'status-changed',
      count: await counts.statusChangedSince(since),
      label: `Prints whose tone status changed ${sinceWords}`,
      href: '/tone-watch',
    },
  ];
};

const archivist: Summary = async (counts, _asker, now) => {
  const images = await counts.imagesProcessing();
  return [
    {
      kind: 'recent-accessions',
      count: await counts.printsCreatedSince(recentSince(now)),
      label: `Prints added to the catalogue in the last ${RECENT_DAYS} days`,
      href: '/prints?sort=-accession',
    },
    {
      kind: 'images-processing',
      count: images.count,
      label: 'Images still being processed',
      href: images.printId ? `/prints/${images.printId}` : '/prints',
    },
    {
      kind: 'imports-under-way',
      count: await counts.importsUnderWay(),
      label: 'Imports under way',
      href: '/imports',
    },
    {
      kind: 'processing-concerns',
      count: await counts.processingConcerns(),
      label: 'Prints with processing concerns',
      href: '/prints?processingRisk=true',
    },
  ];
};

const curator: Summary = async (counts, asker) => [
  {
    kind: 'saved-searches',
    count: await counts.savedSearches(asker.id),
    label: 'Your saved searches',
    href: '/search',
  },
  {
    kind: 'checklists',
    count: await counts.checklists(),
    label: 'Checklists',
    href: '/checklists',
  },
  {
    kind: 'open-loans',
    count: await counts.openLoans(),
    label: 'Loans and shows under way: proposed, agreed or away',
    href: '/loans',
  },
];

const viewer: Summary = async (counts, _asker, now) => [
  {
    kind: 'recent-additions',
    count: await counts.printsCreatedSince(recentSince(now)),
    label: `Prints added to the catalogue in the last ${RECENT_DAYS} days`,
    href: '/prints?sort=-accession',
  },
];

async function fixityItem(counts: OverviewCounts): Promise<OverviewItem> {
  const last = await counts.lastFixityCheck();
  const item = { kind: 'fixity', href: '/fixity' };
  if (!last) return { ...item, count: null, label: 'No fixity check run yet' };
  if (last.status === 'running') {
    return {
      ...item,
      count: null,
      label: `Fixity check running: ${last.checked} of ${last.total} files read`,
    };
  }
  const bad = last.mismatches.length;
  const gone = last.missing.length;
  const on = (last.finished_at ?? last.created_at).toISOString().slice(0, 10);
  const result =
    last.status === 'failed'
      ? 'it did not finish'
      : bad + gone === 0
        ? 'every file matches'
        : 'files differ or are missing';
  return { ...item, count: bad + gone, label: `Last fixity check, ${on}: ${result}` };
}

const admin: Summary = async (counts, _asker, now, context) => {
  const backup = await counts.lastBackup();
  const free = context.uploadsDir === null ? null : await freeBytes(context.uploadsDir);
  const stored = await counts.originalBytes();
  return [
    {
      kind: 'mail-undelivered',
      count: await counts.undeliveredMail(),
      label: 'Messages not yet delivered',
      href: '/outbox',
    },
    {
      kind: 'invitations-open',
      count: await counts.openInvitations(now),
      label: 'People invited, not yet joined',
      href: '/people',
    },
    await fixityItem(counts),
    backup
      ? {
          kind: 'backup-age',
          count: Math.floor((now.getTime() - backup.madeAt.getTime()) / DAY),
          label: `Days since the last backup (${backup.madeAt.toISOString().slice(0, 10)})`,
          href: '/fixity#backups',
        }
      : {
          kind: 'backup-age',
          count: null,
          label: 'No backup recorded',
          href: '/fixity#backups',
        },
    {
      kind: 'uploads-disk',
      count: stored,
      label:
        `Originals take ${readableBytes(stored)}` +
        (free === null ? '' : `; ${readableBytes(free)} free on the disk`),
      href: '/fixity#backups',
    },
  ];
};

const SUMMARIES: Record<Role, Summary> = { viewer, curator, conservator, archivist, admin };

/** Free bytes on the disk that holds the uploads, or null where the system cannot say. */
export async function freeBytes(dir: string): Promise<number | null> {
  try {
    const stats = await statfs(dir);
    return stats.bavail * stats.bsize;
  } catch {
    return null;
  }
}
