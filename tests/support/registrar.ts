import type { SignedIn } from './test-app';

/** A source made through the API; answers its id. */
export async function makeSource(
  archivist: SignedIn,
  body: { name: string; kind: 'person' | 'organisation'; contact?: string },
): Promise<number> {
  const response = await archivist.post('/api/sources').send(body);
  if (response.status !== 201) throw new Error(JSON.stringify(response.body));
  return response.body.id as number;
}

export const IN_COPYRIGHT = 'http://rightsstatements.org/vocab/InC/1.0/';
export const NO_KNOWN_COPYRIGHT = 'http://rightsstatements.org/vocab/NKC/1.0/';
