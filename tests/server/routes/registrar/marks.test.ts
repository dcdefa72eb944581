import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../../support/factories';
import { buildJpeg } from '../../../support/images';
import { startTestApp, type SignedIn, type TestApp } from '../../../support/test-app';

let t: TestApp;
let archivist: SignedIn;
beforeAll(async () => {
  t = await startTestApp();
  archivist = await t.as('archivist');
});
afterAll(() => t.close());

async function printWithVerso(): Promise<{ id: number; versoId: number }> {
  const created = await archivist.post('/api/prints').send(buildPrint({ title: 'Marked' }));
  const verso = await archivist
    .post(`/api/prints/${created.body.id}/assets`)
    .field('view', 'verso')
    .attach('file', await buildJpeg(60, 40, [230, 225, 210]), 'verso.jpg');
  expect(verso.status).toBe(201);
  return { id: created.body.id, versoId: verso.body.id };
}

describe('marks and inscriptions', () => {
  it('keeps marks in order, one marked on the verso photograph', async () => {
    const { id, versoId } = await printWithVerso();
    const marks = [
      {
        position: 'verso',
        kind: 'pencil inscription',
        transcription: 'Lerwick harbour, Aug. 1907',
        reading: 'Lerwick harbour, August 1907',
        assetId: versoId,
        area: { x: 0.1, y: 0.7, width: 0.5, height: 0.12 },
      },
      { position: 'verso', kind: 'blind stamp', transcription: 'J. T. STUDIO' },
    ];
    const patched = await archivist.patch(`/api/prints/${id}`).send({ marks });
    expect(patched.status, JSON.stringify(patched.body)).toBe(200);
    expect(patched.body.marks).toEqual([
      { ...marks[0], private: false },
      { ...marks[1], reading: null, assetId: null, area: null, private: false },
    ]);
  });

  it("refuses a photograph that is not the print's, and an area without a photograph", async () => {
    const { id } = await printWithVerso();
    const other = await printWithVerso();
    const response = await archivist.patch(`/api/prints/${id}`).send({
      marks: [
        {
          position: 'verso',
          kind: 'label',
          transcription: 'x',
          assetId: other.versoId,
        },
        {
          position: 'recto',
          kind: 'ink signature',
          transcription: 'y',
          area: { x: 0, y: 0, width: 0.5, height: 0.5 },
        },
        { position: 'sleeve', kind: 'label', transcription: 'z' },
      ],
    });
    expect(response.status).toBe(422);
    expect(response.body.errors.map((error: { path: string }) => error.path).sort()).toEqual([
      'marks.1.assetId',
      'marks.2.position',
    ]);
    const second = await archivist.patch(`/api/prints/${id}`).send({
      marks: [{ position: 'verso', kind: 'label', transcription: 'x', assetId: other.versoId }],
    });
    expect(second.status).toBe(422);
    expect(second.body.errors[0].path).toBe('marks.0.assetId');
  });

  it('finds a print by the words of its inscriptions, viewers included', async () => {
    const { id } = await printWithVerso();
    await archivist.patch(`/api/prints/${id}`).send({
      marks: [{ position: 'verso', kind: 'pencil inscription', transcription: 'Scalloway pier' }],
    });
    const viewer = await t.as('viewer');
    const found = await viewer.get('/api/prints?q=scalloway');
    expect(found.body.items.map((item: { id: number }) => item.id)).toEqual([id]);
  });

  it('keeps a mark but drops its region when the photograph it is marked on is deleted', async () => {
    const { id, versoId } = await printWithVerso();
    const recto = await archivist
      .post(`/api/prints/${id}/assets`)
      .field('view', 'recto')
      .attach('file', await buildJpeg(60, 40, [120, 100, 80]), 'recto.jpg');
    const area = { x: 0.2, y: 0.6, width: 0.4, height: 0.1 };
    const onVerso = { position: 'verso', kind: 'pencil inscription', transcription: 'No. 12' };
    const onRecto = { position: 'recto', kind: 'ink signature', transcription: 'J. T.' };
    await archivist.patch(`/api/prints/${id}`).send({
      marks: [
        { ...onVerso, assetId: versoId, area },
        { ...onRecto, assetId: recto.body.id, area },
      ],
    });
    expect((await archivist.delete(`/api/assets/${versoId}`)).status).toBe(204);
    const record = await (await t.as('viewer')).get(`/api/prints/${id}`);
    expect(record.body.marks).toEqual([
      { ...onVerso, reading: null, assetId: null, area: null, private: false },
      { ...onRecto, reading: null, assetId: recto.body.id, area, private: false },
    ]);
  });
});
