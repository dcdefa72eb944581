import { lazy, Suspense, type ComponentType } from 'react';
import { createBrowserRouter, RouterProvider, type RouteObject } from 'react-router-dom';
import { Loading } from '@/components/ui/notices';
import { paths } from '@/config/paths';
import { RequireSignIn } from './require-sign-in';
import { NotFoundPage } from './not-found-page';
import { Opening } from './opening';
import { printRecordData, printsData, searchData, toneWatchData } from './route-data';

/**
 * Every page loads on demand (its own chunk): the first page draws with the router, the
 * query client and that page only, and charts, deep zoom and PDF code come with the pages
 * that use them.
 */
function page<K extends string>(
  load: () => Promise<Record<K, ComponentType>>,
  name: K,
): RouteObject['lazy'] {
  return async () => ({ Component: (await load())[name] });
}

/**
 * The record's sections from other features (tone, light, places, condition, open formats).
 * They load once the record has drawn, not before it: waited for by the route, their twenty
 * chunks stood between a phone and the record's first draw.
 */
const once = <T,>(load: () => Promise<T>) => {
  let loaded: Promise<T> | undefined;
  // A failed load (the network dropped) is tried again the next time, not kept.
  return () =>
    (loaded ??= load().catch((error: unknown) => {
      loaded = undefined;
      throw error;
    }));
};
/** All five at once when the first is wanted: one by one, each waited for the one before. */
const loadSections = once(async () => {
  const [tone, light, places, condition, formats] = await Promise.all([
    import('@/features/tone/components/tone-panel'),
    import('@/features/loans/components/light-panel'),
    import('@/features/places/components/movement-history'),
    import('@/features/condition/components/condition-panel'),
    import('@/features/linked-data/components/open-formats'),
  ]);
  return {
    TonePanel: tone.TonePanel,
    LightPanel: light.LightPanel,
    MovementHistory: places.MovementHistory,
    ConditionPanel: condition.ConditionPanel,
    OpenFormats: formats.OpenFormats,
  };
});
type Sections = Awaited<ReturnType<typeof loadSections>>;
const sectionOf = <K extends keyof Sections>(name: K) =>
  lazy(async () => ({ default: (await loadSections())[name] }));
const TonePanel = sectionOf('TonePanel');
const LightPanel = sectionOf('LightPanel');
const MovementHistory = sectionOf('MovementHistory');
const ConditionPanel = sectionOf('ConditionPanel');
const OpenFormats = sectionOf('OpenFormats');

async function printRecord(): Promise<Pick<RouteObject, 'element'>> {
  const { PrintRecordPage } = await import('@/features/prints/components/print-record-page');
  return {
    element: (
      <PrintRecordPage
        sections={(print) => (
          // One boundary: the sections appear together, in their order, not one by one.
          <Suspense fallback={<Loading label="Loading the record's sections…" />}>
            <TonePanel printId={print.id} />
            <LightPanel printId={print.id} status={print.status} />
            <MovementHistory printId={print.id} />
            <ConditionPanel print={print} />
            <OpenFormats print={print} />
          </Suspense>
        )}
      />
    ),
  };
}

/** A place's page takes the storage environment section from its feature. */
async function placePage(): Promise<Pick<RouteObject, 'element'>> {
  const [{ PlacePage }, { PlaceEnvironment }] = await Promise.all([
    import('@/features/places/components/place-page'),
    import('@/features/environment/components/place-environment'),
  ]);
  return { element: <PlacePage sections={(place) => <PlaceEnvironment placeId={place.id} />} /> };
}

const routes: RouteObject[] = [
  {
    path: paths.signIn,
    lazy: page(() => import('@/features/auth/components/sign-in-page'), 'SignInPage'),
  },
  {
    path: paths.acceptInvitation,
    lazy: page(
      () => import('@/features/account/components/accept-invitation-page'),
      'AcceptInvitationPage',
    ),
  },
  {
    path: paths.forgotPassword,
    lazy: page(
      () => import('@/features/account/components/forgot-password-page'),
      'ForgotPasswordPage',
    ),
  },
  {
    path: paths.resetPassword,
    lazy: page(
      () => import('@/features/account/components/reset-password-page'),
      'ResetPasswordPage',
    ),
  },
  {
    element: <RequireSignIn />,
    children: [
      {
        index: true,
        lazy: page(() => import('@/features/overview/components/start-page'), 'StartPage'),
      },
      {
        path: paths.prints,
        loader: printsData,
        lazy: page(() => import('@/features/prints/components/prints-list-page'), 'PrintsListPage'),
      },
      {
        path: paths.newPrint,
        lazy: page(
          () => import('@/features/prints/components/print-form-pages'),
          'PrintCreatePage',
        ),
      },
      {
        path: paths.deletedPrints,
        lazy: page(
          () => import('@/features/prints/components/deleted-prints-page'),
          'DeletedPrintsPage',
        ),
      },
      { path: '/prints/:id', loader: printRecordData, lazy: printRecord },
      {
        path: '/prints/:id/condition-reports/new',
        lazy: page(
          () => import('@/features/condition/components/condition-report-page'),
          'ConditionReportPage',
        ),
      },
      {
        path: '/prints/:id/condition-reports/:reportId/edit',
        lazy: page(
          () => import('@/features/condition/components/condition-report-page'),
          'ConditionReportPage',
        ),
      },
      {
        path: '/prints/:id/treatments/new',
        lazy: page(() => import('@/features/condition/components/treatment-page'), 'TreatmentPage'),
      },
      {
        path: '/prints/:id/edit',
        lazy: page(() => import('@/features/prints/components/print-form-pages'), 'PrintEditPage'),
      },
      {
        path: paths.papers,
        lazy: page(() => import('@/features/reference/components/papers-page'), 'PapersPage'),
      },
      {
        path: paths.negatives,
        lazy: page(() => import('@/features/reference/components/negatives-page'), 'NegativesPage'),
      },
      {
        path: paths.sources,
        lazy: page(() => import('@/features/sources/components/sources-page'), 'SourcesPage'),
      },
      {
        path: paths.places,
        lazy: page(() => import('@/features/places/components/places-page'), 'PlacesPage'),
      },
      {
        path: paths.loans,
        lazy: page(() => import('@/features/loans/components/loans-page'), 'LoansPage'),
      },
      {
        path: '/loans/:id',
        lazy: page(() => import('@/features/loans/components/loan-page'), 'LoanPage'),
      },
      {
        path: '/places/:id',
        lazy: placePage,
      },
      {
        path: '/negatives/:id',
        lazy: page(
          () => import('@/features/printing-log/components/negative-page'),
          'NegativePage',
        ),
      },
      {
        path: paths.chemistry,
        lazy: page(() => import('@/features/chemistry/components/chemistry-page'), 'ChemistryPage'),
      },
      {
        path: paths.solutionMaker,
        lazy: page(
          () => import('@/features/chemistry/components/solution-maker-page'),
          'SolutionMakerPage',
        ),
      },
      {
        path: '/chemistry/batches/:id',
        lazy: page(() => import('@/features/chemistry/components/batch-page'), 'BatchPage'),
      },
      {
        path: paths.toneWatch,
        loader: toneWatchData,
        lazy: page(() => import('@/features/tone/components/tone-watch-page'), 'ToneWatchPage'),
      },
      {
        path: paths.toneRounds,
        lazy: page(() => import('@/features/tone/components/check-round-page'), 'CheckRoundPage'),
      },
      {
        path: paths.toneImport,
        lazy: page(() => import('@/features/tone/components/import-page'), 'ImportPage'),
      },
      {
        path: paths.insights,
        lazy: page(() => import('@/features/tone/components/insights-page'), 'InsightsPage'),
      },
      {
        path: paths.settings,
        lazy: page(() => import('@/features/settings/components/settings-page'), 'SettingsPage'),
      },
      {
        path: paths.people,
        lazy: page(() => import('@/features/people/components/people-page'), 'PeoplePage'),
      },
      {
        path: paths.outbox,
        lazy: page(() => import('@/features/outbox/components/outbox-page'), 'OutboxPage'),
      },
      {
        path: paths.account,
        lazy: page(
          () => import('@/features/account/components/change-password-page'),
          'ChangePasswordPage',
        ),
      },
      {
        path: paths.fixity,
        lazy: page(() => import('@/features/fixity/components/fixity-page'), 'FixityPage'),
      },
      {
        path: paths.search,
        loader: searchData,
        lazy: page(() => import('@/features/search/components/search-page'), 'SearchPage'),
      },
      {
        path: paths.checklists,
        lazy: page(() => import('@/features/search/components/checklists-page'), 'ChecklistsPage'),
      },
      {
        path: '/checklists/:id',
        lazy: page(() => import('@/features/search/components/checklist-page'), 'ChecklistPage'),
      },
      {
        path: '/checklists/:id/printout',
        lazy: page(
          () => import('@/features/search/components/checklist-printout-page'),
          'ChecklistPrintoutPage',
        ),
      },
      {
        path: paths.imports,
        lazy: page(() => import('@/features/imports/components/imports-page'), 'ImportsPage'),
      },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
];

let router: ReturnType<typeof createBrowserRouter> | undefined;

/**
 * Made at the first render, not when this module is evaluated: creating it matches the
 * address and starts the loaders, about half of the entry module's task on a slow phone, and
 * in React's first render it is a task of its own. Kept for the page's life (StrictMode's
 * second render finds it made).
 */
function appRouter() {
  // One pathless route around them all: while the first page's code loads, "Opening
  // Printwarden…" stays on screen (the words index.html painted) instead of a blank page.
  router ??= createBrowserRouter([{ HydrateFallback: Opening, children: routes }]);
  return router;
}

export function AppRouter() {
  return <RouterProvider router={appRouter()} />;
}
