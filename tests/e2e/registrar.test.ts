import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';
import { buildJpeg } from '../support/images';

const live = useLiveServerAndBrowser();
const IN_COPYRIGHT = 'http://rightsstatements.org/vocab/InC/1.0/';

/** A JSON request as the signed-in page, with its CSRF header. */
async function api(page: Page, method: 'post' | 'patch', path: string, data: object) {
  const session = (await (await page.request.get(`${live.server.url}/api/session`)).json()) as {
    csrfToken: string;
  };
  const response = await page.request[method](`${live.server.url}${path}`, {
    headers: { 'X-CSRF-Token': session.csrfToken },
    data,
  });
  expect(response.status(), await response.text()).toBeLessThan(300);
  return (await response.json()) as { id: number };
}

describe('the registrar record (issue 19, "Done when")', () => {
  it('archivist records a gift; curator finds it by donor and rights; viewer reads no price', async () => {
    // Archivist: a donor, a gift with a two-link chain, In Copyright, two verso inscriptions,
    // one marked on the verso photograph. (Through the API: the form's path is in
    // registrar-form.test.ts, and the form does not draw regions on photographs.)
    const archivist = await signInAs(live.browser, live.server.url, 'archivist');
    const donor = await api(archivist, 'post', '/api/sources', {
      name: 'Halcyon Verey',
      kind: 'person',
      contact: 'halcyon@verey.test',
    });
    const print = await api(archivist, 'post', '/api/prints', {
      title: 'Boathouse in rain',
      process: 'salt print',
      acquisition: {
        method: 'gift',
        sourceId: donor.id,
        acquiredOn: '2025-11-03',
        creditLine: 'Gift of Halcyon Verey, 2025',
        price: 75,
      },
      provenance: [
        { owner: 'Wren Halloway', from: '2019', to: '2021', evidence: 'Initials on the verso' },
        { owner: 'Halcyon Verey', from: '2021', to: '2025' },
      ],
      rights: { statement: IN_COPYRIGHT, holder: 'Wren Halloway' },
    });
    const session = (await (
      await archivist.request.get(`${live.server.url}/api/session`)
    ).json()) as { csrfToken: string };
    const verso = await archivist.request.post(`${live.server.url}/api/prints/${print.id}/assets`, {
      headers: { 'X-CSRF-Token': session.csrfToken },
      multipart: {
        view: 'verso',
        file: {
          name: 'verso.jpg',
          mimeType: 'image/jpeg',
          buffer: await buildJpeg(600, 800, [235, 228, 212]),
        },
      },
    });
    expect(verso.status()).toBe(201);
    const versoId = ((await verso.json()) as { id: number }).id;
    await api(archivist, 'patch', `/api/prints/${print.id}`, {
      marks: [
        {
          position: 'verso',
          kind: 'pencil inscription',
          transcription: 'Boathouse, Nov.',
          assetId: versoId,
          area: { x: 0.1, y: 0.75, width: 0.5, height: 0.12 },
        },
        { position: 'verso', kind: 'pencil inscription', transcription: 'W. H.' },
      ],
    });
    await archivist.goto(`${live.server.url}/prints/${print.id}`);
    await expect
      .poll(() => archivist.getByRole('definition').filter({ hasText: '75' }).count())
      .toBe(1);

    // Curator: every print from that donor (through the record's link), every In Copyright print.
    const curator = await signInAs(
      live.browser,
      live.server.url,
      'curator',
      undefined,
      `/prints/${print.id}`,
    );
    await curator.getByRole('link', { name: 'Halcyon Verey' }).click();
    const rows = curator.getByRole('table').getByRole('row');
    await expect.poll(() => rows.filter({ hasText: 'Boathouse in rain' }).count()).toBe(1);
    await expect.poll(() => rows.count()).toBe(2); // the header and the one print
    await curator.getByRole('button', { name: 'Show prints from every source' }).click();
    await curator.getByLabel('Rights').selectOption(IN_COPYRIGHT);
    await expect.poll(() => curator.url()).toContain('rightsStatement=');
    await expect.poll(() => rows.filter({ hasText: 'Boathouse in rain' }).count()).toBe(1);

    // Viewer: the credit line, the chain and the inscriptions; no price, no contact.
    const viewer = await signInAs(
      live.browser,
      live.server.url,
      'viewer',
      undefined,
      `/prints/${print.id}`,
    );
    const came = viewer.getByRole('region', { name: 'How it came in' });
    await expect.poll(() => came.getByText('Gift of Halcyon Verey, 2025').count()).toBe(1);
    expect(await came.getByText('Price paid').count()).toBe(0);
    const owners = viewer.getByRole('list', { name: 'Earlier owners' }).getByRole('listitem');
    expect(await owners.allTextContents()).toEqual([
      expect.stringMatching(/^Wren Halloway \(2019 to 2021\)/),
      'Halcyon Verey (2021 to 2025)',
    ]);
    const marks = viewer.getByRole('list', { name: 'Marks and inscriptions' });
    expect(await marks.getByText('“Boathouse, Nov.”').count()).toBe(1);
    expect(await marks.getByText('marked on its photograph', { exact: false }).count()).toBe(1);
    expect(
      await viewer.getByRole('region', { name: 'Rights' }).getByText('In Copyright').count(),
    ).toBe(1);
    const page = await viewer.content();
    expect(page).not.toContain('halcyon@verey.test');

    // The JSON-LD carries it all.
    const jsonld = await (
      await viewer.request.get(`${live.server.url}/api/prints/${print.id}.jsonld`)
    ).json();
    expect(jsonld['dcterms:rights']).toEqual({ '@id': IN_COPYRIGHT });
    expect(jsonld['schema:creditText']).toBe('Gift of Halcyon Verey, 2025');
    expect(jsonld['schema:copyrightHolder']).toBe('Wren Halloway');
    expect(jsonld['dcterms:provenance']['rdfs:label']).toContain('Halcyon Verey (2021 to 2025)');
    expect(
      jsonld['schema:hasPart'].map((part: { 'schema:text': string }) => part['schema:text']),
    ).toEqual(['Boathouse, Nov.', 'W. H.']);
  });
});
