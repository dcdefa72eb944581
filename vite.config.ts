import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import type { Plugin, Rollup } from 'vite';
import { ROUTE_PRELOADS } from './server/client/route-preloads.ts';
import { defineConfig, type TestProjectInlineConfiguration } from 'vitest/config';

const fromRoot = (path: string) => fileURLToPath(new URL(path, import.meta.url));
const apiPort = process.env.PORT ?? '3000';

/**
 * EB Garamond draws every page title (weight 500: page-header.tsx, the sign-in page's h1), the
 * section headings (h2 and h3 at 400, and a record's description) and the name in the header
 * (600). The browser finds a font file only after the script has drawn the text that uses it:
 * the record's 400 and 600 files started about 1 s after the page (Lighthouse's trace), and its
 * largest text, the description in 400, drew when they came. Preload links for those three
 * files (the Latin subset, woff2) let them load beside the script.
 */
const PRELOADED_FONTS = [400, 500, 600];

function preloadFonts(): Plugin {
  return {
    name: 'printwarden:preload-fonts',
    apply: 'build',
    transformIndexHtml: {
      order: 'post',
      handler(_html, { bundle }) {
        return PRELOADED_FONTS.map((weight) => {
          const pattern = new RegExp(`eb-garamond-latin-${weight}-normal-[\\w-]+\\.woff2$`);
          const file = Object.keys(bundle ?? {}).find((name) => pattern.test(name));
          if (!file) throw new Error(`EB Garamond ${weight} (Latin) was not bundled`);
          return {
            tag: 'link',
            attrs: {
              rel: 'preload',
              href: `/${file}`,
              as: 'font',
              type: 'font/woff2',
              crossorigin: '',
            },
            injectTo: 'head' as const,
          };
        });
      },
    },
  };
}

/**
 * Route-keyed preloads (server/client/route-preloads.ts): writes `route-preloads.json`, each
 * route's page chunks and the chunks they import, less what the index page already loads.
 * The server names them in the index page it answers for that route, so a page's code comes
 * beside the main script instead of after it has run. A route module no chunk holds fails
 * the build.
 */
function routePreloads(): Plugin {
  return {
    name: 'printwarden:route-preloads',
    apply: 'build',
    generateBundle(_options, bundle) {
      const chunks = Object.values(bundle).filter(
        (item): item is Rollup.OutputChunk => item.type === 'chunk',
      );
      const byName = new Map(chunks.map((chunk) => [chunk.fileName, chunk]));
      const withImports = (start: Rollup.OutputChunk[]) => {
        const seen = new Set<string>();
        const visit = (chunk: Rollup.OutputChunk) => {
          if (seen.has(chunk.fileName)) return;
          seen.add(chunk.fileName);
          for (const name of chunk.imports) visit(byName.get(name)!);
        };
        start.forEach(visit);
        return seen;
      };
      const initial = withImports(chunks.filter((chunk) => chunk.isEntry));
      const routes: Record<string, string[]> = {};
      for (const route of ROUTE_PRELOADS) {
        const own = route.modules.map((module) => {
          const id = fromRoot(`./${module}`);
          const chunk = chunks.find((candidate) => candidate.facadeModuleId === id);
          if (!chunk) throw new Error(`route-preloads: no chunk for ${module}`);
          return chunk;
        });
        routes[route.name] = [...withImports(own)]
          .filter((name) => !initial.has(name))
          .map((name) => `/${name}`);
      }
      this.emitFile({
        type: 'asset',
        fileName: 'route-preloads.json',
        source: JSON.stringify(routes, null, 2),
      });
    },
  };
}

/** A PostgreSQL server whose user may create databases; the API tests run there too. */
const postgresUrl = process.env.TEST_POSTGRES_URL ?? '';

const SAME_ON_EVERY_DATABASE = [
  'tests/server/crash/**',
  'tests/server/first-run/create-admin.test.ts',
  'tests/server/lifecycle/shutdown.test.ts',
  'tests/server/lint/**',
  'tests/server/routes/route-list.test.ts',
  'tests/server/services/imports/csv-source.test.ts',
  'tests/server/services/search/*.test.ts',
  'tests/server/services/storage/**',
  // Heavy, and about what comes before the database or beside it: random bodies refused by
  // validation (which sits before any query), and generated images attached to the demo (the
  // write path they go through is tested on both by the other seed and route files).
  'tests/server/fuzz/bad-input.test.ts',
  // The demo's content: what it seeds, not how a database stores it (every write it makes
  // goes through the one write path, which the route and service files run on both).
  'tests/seeds/**',
  // Files, tiles, PDFs and size limits: what they test is made from the stored files and the
  // request, and each one's few queries are the same reads and writes other files run on both.
  'tests/server/routes/assets-on-s3.test.ts',
  'tests/server/routes/assets-serving.test.ts',
  'tests/server/routes/iiif.test.ts',
  'tests/server/routes/print-report.test.ts',
  'tests/server/security/tone-import-size.test.ts',
];

/** The API tests, each file on a fresh database: SQLite, or PostgreSQL at `postgres`. */
function apiProject(name: string, postgres: string): TestProjectInlineConfiguration {
  return {
    extends: true,
    test: {
      name,
      globalSetup: postgres ? ['tests/support/postgres-global-setup.ts'] : [],
      // Files that never open the test database (child servers on their own SQLite file,
      // pure functions, source scans), or whose subject does not touch the dialect, would
      // only run twice.
      exclude: postgres ? SAME_ON_EVERY_DATABASE : [],
      include: ['tests/server/**/*.test.ts', 'tests/seeds/**/*.test.ts'],
      environment: 'node',
      env: { TEST_DATABASE_SERVER: postgres },
      pool: 'forks',
      // One module graph per worker instead of one per file: importing the server took
      // about 1.4 s of every file. Each file still starts its own app on its own database.
      isolate: false,
      testTimeout: 20_000,
      hookTimeout: 30_000,
    },
  };
}

export default defineConfig({
  plugins: [react(), tailwindcss(), preloadFonts(), routePreloads()],
  resolve: {
    alias: { '@shared': fromRoot('./shared'), '@': fromRoot('./src') },
  },
  server: {
    port: 5173,
    proxy: { '/api': `http://localhost:${apiPort}` },
  },
  // The client goes to dist/client; scripts/build-server.mjs compiles the server to dist/server.
  build: { outDir: 'dist/client', emptyOutDir: true, chunkSizeWarningLimit: 700 },
  test: {
    // Type checking lives in `npm run typecheck`; vitest only runs tests.
    // Vitest's default is one worker fewer than the cores: one worker on a 2-core machine.
    // Two keep 2 cores busy (vmstat: 5 % idle through a clean CI run); a third made that run
    // slower (886 → 978 s), so time is saved only by doing less work.
    maxWorkers: Math.max(2, availableParallelism()),
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['tests/shared/**/*.test.ts'],
          environment: 'node',
          isolate: false,
        },
      },
      {
        // The client's pure modules (cache keys, the invalidation rule) with a real QueryClient.
        extends: true,
        test: { name: 'client', include: ['tests/client/**/*.test.ts'], environment: 'node' },
      },
      apiProject('api', ''),
      // The same tests on PostgreSQL when a server is given (`.ci/run` starts one).
      ...(postgresUrl ? [apiProject('api-postgres', postgresUrl)] : []),
      {
        extends: true,
        test: {
          name: 'e2e',
          include: ['tests/e2e/**/*.test.ts'],
          globalSetup: ['tests/support/e2e-global-setup.ts'],
          environment: 'node',
          pool: 'forks',
          isolate: false,
          // expect.poll waits for a state; its 1 s default failed under load where an upload
          // or a re-render takes longer. Twenty seconds is a bound, not a pause.
          expect: { poll: { timeout: 20_000 } },
          testTimeout: 60_000,
          hookTimeout: 90_000,
        },
      },
    ],
  },
});
