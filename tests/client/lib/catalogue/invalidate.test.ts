import { QueryClient } from '@tanstack/react-query';
import { describe, expect, it } from 'vitest';
import { conditionQueries } from '../../../../src/features/condition/api/condition-queries';
import { printForCondition } from '../../../../src/features/condition/api/print-summary';
import { overviewQueries } from '../../../../src/lib/overview-queries';
import { printingLogQueries } from '../../../../src/features/printing-log/api/printing-log';
import {
  checklistQueries,
  savedSearchQueries,
} from '../../../../src/features/search/api/search-queries';
import { toneQueries } from '../../../../src/features/tone/api/tone-queries';
import { chemistryQueries } from '../../../../src/features/chemistry/api/chemistry-queries';
import { peopleQueries } from '../../../../src/features/people/api/people-queries';
import { catalogueKeys, invalidateCatalogue, printQueries } from '../../../../src/lib/catalogue';
import { sessionQueries } from '../../../../src/lib/session';
import { settingsQueries } from '../../../../src/lib/settings-api';

type Key = readonly unknown[];

/** Every view that shows a print or what prints derive, with the key its page asks under. */
const printViews: Record<string, Key> = {
  'Prints list': printQueries.list({ pageSize: '25' }).queryKey,
  'Search results': printQueries.list({ pageSize: '25', q: 'salt', toneStatus: 'fading' }).queryKey,
  'Search histograms': printQueries.collection().queryKey,
  'print record': printQueries.detail(7).queryKey,
  'record history': printQueries.history(7).queryKey,
  'condition form’s print': printForCondition(7).queryKey,
  'tone panel checks': toneQueries.checks(7).queryKey,
  'tone panel trend': toneQueries.trend(7).queryKey,
  'another print’s tone panel': toneQueries.trend(8).queryKey,
  'tone watch': toneQueries.watch({ status: 'fading' }).queryKey,
  alerts: toneQueries.alerts().queryKey,
  'check round': toneQueries.round('2026-01-01', '2026-12-31').queryKey,
  insights: toneQueries.cohorts('paper').queryKey,
  'condition reports': conditionQueries.reports(7).queryKey,
  treatments: conditionQueries.treatments(7).queryKey,
  'start page': overviewQueries.mine().queryKey,
  checklists: checklistQueries.list().queryKey,
  checklist: checklistQueries.detail(3).queryKey,
  'printing log': printingLogQueries.detail(2).queryKey,
  'solution batch': chemistryQueries.batch(4).queryKey,
};

/** Views that do not show prints: a print's write leaves them alone. */
const otherViews: Record<string, Key> = {
  session: sessionQueries.current().queryKey,
  people: peopleQueries.users().queryKey,
  'saved searches': savedSearchQueries.list().queryKey,
  settings: settingsQueries.current().queryKey,
};

function cacheWithEveryView(): QueryClient {
  const client = new QueryClient();
  for (const key of [...Object.values(printViews), ...Object.values(otherViews)])
    client.setQueryData(key, { cached: true });
  return client;
}

const invalidated = (client: QueryClient, views: Record<string, Key>) =>
  Object.fromEntries(
    Object.entries(views).map(([name, key]) => [
      name,
      client.getQueryState(key)?.isInvalidated ?? 'missing',
    ]),
  );

describe('the catalogue’s one invalidation rule', () => {
  it('marks every view of prints stale after a write: lists, record, tone panel, watch, round', async () => {
    const client = cacheWithEveryView();
    await invalidateCatalogue(client);
    const expected = Object.fromEntries(Object.keys(printViews).map((name) => [name, true]));
    expect(invalidated(client, printViews)).toEqual(expected);
  });

  it('leaves views that show no prints alone', async () => {
    const client = cacheWithEveryView();
    await invalidateCatalogue(client);
    const expected = Object.fromEntries(Object.keys(otherViews).map((name) => [name, false]));
    expect(invalidated(client, otherViews)).toEqual(expected);
  });

  it('drops a deleted print’s record and its parts, keeping the other prints', async () => {
    const client = cacheWithEveryView();
    await invalidateCatalogue(client, { removed: [7] });
    expect(client.getQueryData(printQueries.detail(7).queryKey)).toBeUndefined();
    expect(client.getQueryData(toneQueries.checks(7).queryKey)).toBeUndefined();
    expect(client.getQueryData(toneQueries.trend(8).queryKey)).toEqual({ cached: true });
  });
});

describe('catalogue keys', () => {
  it('give the Prints list and Search one cache entry for the same question', () => {
    const fromPrintsList = printQueries.list({ pageSize: '25', q: 'weir', sort: 'title' });
    const fromSearch = printQueries.list({ sort: 'title', q: 'weir', pageSize: '25', view: '' });
    const fromSearchGrid = printQueries.list({
      q: 'weir',
      view: 'grid',
      sort: 'title',
      pageSize: '25',
    });
    expect(fromSearch.queryKey).toEqual(fromPrintsList.queryKey);
    expect(fromSearchGrid.queryKey).toEqual(fromPrintsList.queryKey);
  });

  it('keep different questions apart', () => {
    expect(printQueries.list({ q: 'weir' }).queryKey).not.toEqual(
      printQueries.list({ q: 'weir', page: '2' }).queryKey,
    );
  });

  it('put every part of one print under that print’s key', () => {
    const prefix = catalogueKeys.print(7);
    for (const key of [
      catalogueKeys.history(7),
      catalogueKeys.toneChecks(7),
      catalogueKeys.toneTrend(7),
      catalogueKeys.conditionReports(7),
      catalogueKeys.treatments(7),
    ])
      expect(key.slice(0, prefix.length)).toEqual(prefix);
  });
});
