import express from 'express';
import { describe, expect, it } from 'vitest';
import { listRoutes, patternToRegExp, routeMatcher } from '../../../server/routes/route-list';

function sampleApp() {
  const app = express();
  const inner = express.Router();
  inner.get('/', (_req, res) => res.end());
  inner
    .route('/:id')
    .patch((_req, res) => res.end())
    .delete((_req, res) => res.end());
  const nested = express.Router();
  nested.post('/:token', (_req, res) => res.end());
  inner.use('/deep', nested);
  app.use('/api/things', inner);
  app.get('/api/things.csv', (_req, res) => res.end());
  app.get('/{*splat}', (_req, res) => res.end());
  return app;
}

describe('listRoutes (Express 5 router stack)', () => {
  it('lists every method and full path, mounted and nested routers included', () => {
    expect(listRoutes(sampleApp())).toEqual([
      { method: 'get', path: '/api/things' },
      { method: 'patch', path: '/api/things/:id' },
      { method: 'delete', path: '/api/things/:id' },
      { method: 'post', path: '/api/things/deep/:token' },
      { method: 'get', path: '/api/things.csv' },
      { method: 'get', path: '/{*splat}' },
    ]);
  });
});

describe('routeMatcher', () => {
  it('names the pattern a path matched, never the id or token itself', () => {
    const routeOf = routeMatcher(sampleApp());
    expect(routeOf('PATCH', '/api/things/42')).toBe('/api/things/:id');
    expect(routeOf('POST', '/api/things/deep/abc_DEF-123')).toBe('/api/things/deep/:token');
    expect(routeOf('GET', '/api/things.csv')).toBe('/api/things.csv');
    expect(routeOf('HEAD', '/api/things')).toBe('/api/things');
    expect(routeOf('PUT', '/api/things/42')).toBeNull();
  });

  it('treats a dot as a dot and a splat as anything', () => {
    expect(patternToRegExp('/api/prints/:id.jsonld').test('/api/prints/7.jsonld')).toBe(true);
    expect(patternToRegExp('/api/prints.csv').test('/api/printsXcsv')).toBe(false);
    expect(patternToRegExp('/{*splat}').test('/people/new')).toBe(true);
  });
});
