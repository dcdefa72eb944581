import { lazy, Suspense, type ReactNode } from 'react';
import { createBrowserRouter, Navigate, RouterProvider } from 'react-router-dom';
import { paths } from '@/config/paths';
import { RequireSignIn } from './require-sign-in';
import { SignInPage } from '@/features/auth/components/sign-in-page';
import { PrintsListPage } from '@/features/prints/components/prints-list-page';
import { PrintRecordPage } from '@/features/prints/components/print-record-page';
import { DeletedPrintsPage } from '@/features/prints/components/deleted-prints-page';
import { PrintCreatePage, PrintEditPage } from '@/features/prints/components/print-form-pages';
import { PapersPage } from '@/features/reference/components/papers-page';
import { NegativesPage } from '@/features/reference/components/negatives-page';
import { PlacesPage } from '@/features/places/components/places-page';
import { ChemistryPage } from '@/features/chemistry/components/chemistry-page';
import { BatchPage } from '@/features/chemistry/components/batch-page';
import { SolutionMakerPage } from '@/features/chemistry/components/solution-maker-page';
import { NegativePage } from '@/features/printing-log/components/negative-page';
import { PeoplePage } from '@/features/people/components/people-page';
import { OutboxPage } from '@/features/outbox/components/outbox-page';
import { AcceptInvitationPage } from '@/features/account/components/accept-invitation-page';
import { ForgotPasswordPage } from '@/features/account/components/forgot-password-page';
import { ResetPasswordPage } from '@/features/account/components/reset-password-page';
import { ChangePasswordPage } from '@/features/account/components/change-password-page';
import { FixityPage } from '@/features/fixity/components/fixity-page';
import { SearchPage } from '@/features/search/components/search-page';
import { ChecklistsPage } from '@/features/search/components/checklists-page';
import { ChecklistPage } from '@/features/search/components/checklist-page';
import { ChecklistPrintoutPage } from '@/features/search/components/checklist-printout-page';
import { ConditionPanel } from '@/features/condition/components/condition-panel';
import { ConditionReportPage } from '@/features/condition/components/condition-report-page';
import { TreatmentPage } from '@/features/condition/components/treatment-page';
import { ImportsPage } from '@/features/imports/components/imports-page';
import { OpenFormats } from '@/features/linked-data/components/open-formats';
import { NotFoundPage } from './not-found-page';
import { TonePanel } from '@/features/tone/components/tone-panel';
import { Loading } from '@/components/ui/notices';

// The tone pages load on demand (Insights pulls in the chart library).
const tonePage = (load: () => Promise<{ default: () => ReactNode }>) => {
  const Page = lazy(load);
  return (
    <Suspense fallback={<Loading />}>
      <Page />
    </Suspense>
  );
};
const toneWatch = () =>
  import('@/features/tone/components/tone-watch-page').then((m) => ({ default: m.ToneWatchPage }));
const checkRound = () =>
  import('@/features/tone/components/check-round-page').then((m) => ({
    default: m.CheckRoundPage,
  }));
const toneImport = () =>
  import('@/features/tone/components/import-page').then((m) => ({ default: m.ImportPage }));
const insights = () =>
  import('@/features/tone/components/insights-page').then((m) => ({ default: m.InsightsPage }));
const settings = () =>
  import('@/features/tone/components/settings-page').then((m) => ({ default: m.SettingsPage }));

const router = createBrowserRouter([
  { path: paths.signIn, element: <SignInPage /> },
  { path: paths.acceptInvitation, element: <AcceptInvitationPage /> },
  { path: paths.forgotPassword, element: <ForgotPasswordPage /> },
  { path: paths.resetPassword, element: <ResetPasswordPage /> },
  {
    element: <RequireSignIn />,
    children: [
      { index: true, element: <Navigate to={paths.prints} replace /> },
      { path: paths.prints, element: <PrintsListPage /> },
      { path: paths.newPrint, element: <PrintCreatePage /> },
      { path: paths.deletedPrints, element: <DeletedPrintsPage /> },
      {
        path: '/prints/:id',
        element: (
          <PrintRecordPage
            sections={(print) => (
              <>
                <TonePanel printId={print.id} />
                <ConditionPanel print={print} />
                <OpenFormats print={print} />
              </>
            )}
          />
        ),
      },
      { path: '/prints/:id/condition-reports/new', element: <ConditionReportPage /> },
      { path: '/prints/:id/condition-reports/:reportId/edit', element: <ConditionReportPage /> },
      { path: '/prints/:id/treatments/new', element: <TreatmentPage /> },
      { path: '/prints/:id/edit', element: <PrintEditPage /> },
      { path: paths.papers, element: <PapersPage /> },
      { path: paths.negatives, element: <NegativesPage /> },
      { path: paths.places, element: <PlacesPage /> },
      { path: '/negatives/:id', element: <NegativePage /> },
      { path: paths.chemistry, element: <ChemistryPage /> },
      { path: paths.solutionMaker, element: <SolutionMakerPage /> },
      { path: '/chemistry/batches/:id', element: <BatchPage /> },
      { path: paths.toneWatch, element: tonePage(toneWatch) },
      { path: paths.toneRounds, element: tonePage(checkRound) },
      { path: paths.toneImport, element: tonePage(toneImport) },
      { path: paths.insights, element: tonePage(insights) },
      { path: paths.settings, element: tonePage(settings) },
      { path: paths.people, element: <PeoplePage /> },
      { path: paths.outbox, element: <OutboxPage /> },
      { path: paths.account, element: <ChangePasswordPage /> },
      { path: paths.fixity, element: <FixityPage /> },
      { path: paths.search, element: <SearchPage /> },
      { path: paths.checklists, element: <ChecklistsPage /> },
      { path: '/checklists/:id', element: <ChecklistPage /> },
      { path: '/checklists/:id/printout', element: <ChecklistPrintoutPage /> },
      { path: paths.imports, element: <ImportsPage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
