import { describe, expect, it } from 'vitest';
import { preloadLinks } from '../../../server/client/index-page';

const chunks = { record: ['/assets/record.js'], toneWatch: ['/assets/tone-watch.js'] };
const fetched = (links: string[]) =>
  links.flatMap((link) => /rel="preload" href="([^"]+)" as="fetch"/.exec(link)?.[1] ?? []);

describe('preloads of the opened page by role', () => {
  const record = new URL('http://host/prints/3');

  it('names a record’s condition reports and treatments for a curator, who may read them', () => {
    expect(fetched(preloadLinks(record, chunks, 'curator'))).toEqual([
      '/api/prints/3',
      '/api/prints/3/tone-checks',
      '/api/prints/3/tone-trend',
      '/api/prints/3/condition-reports',
      '/api/prints/3/treatments',
    ]);
  });

  it('leaves out for a viewer what would answer 403, and keeps the page’s code', () => {
    const links = preloadLinks(record, chunks, 'viewer');
    expect(fetched(links)).toEqual([
      '/api/prints/3',
      '/api/prints/3/tone-checks',
      '/api/prints/3/tone-trend',
    ]);
    expect(links.some((link) => link.includes('/assets/record.js'))).toBe(true);
  });

  it('names Tone watch’s data only for a role that may open it', () => {
    const watch = new URL('http://host/tone-watch');
    expect(fetched(preloadLinks(watch, chunks, 'viewer'))).toEqual([]);
    expect(fetched(preloadLinks(watch, chunks, 'conservator'))).toEqual([
      '/api/tone-watch',
      '/api/alerts',
      '/api/papers',
      '/api/locations',
    ]);
  });

  it('names no data for someone not signed in', () => {
    expect(fetched(preloadLinks(record, chunks, null))).toEqual([]);
  });
});
