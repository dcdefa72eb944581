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
import { ConditionPanel } from '@/features/condition/components/condition-panel';
import { ConditionReportPage } from '@/features/condition/components/condition-report-page';
import { TreatmentPage } from '@/features/condition/components/treatment-page';
import { ImportsPage } from '@/features/imports/components/imports-page';
import { OpenFormats } from '@/features/linked-data/components/open-formats';
import { NotFoundPage } from './not-found-page';

const router = createBrowserRouter([
  { path: paths.signIn, element: <SignInPage /> },
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
                <ConditionPanel print={print} />
                <OpenFormats print={print} />
              </>
            )}
          />
        ),
      },
      { path: '/prints/:id/condition-reports/new', element: <ConditionReportPage /> },
      { path: '/prints/:id/treatments/new', element: <TreatmentPage /> },
      { path: '/prints/:id/edit', element: <PrintEditPage /> },
      { path: paths.papers, element: <PapersPage /> },
      { path: paths.negatives, element: <NegativesPage /> },
      { path: paths.places, element: <PlacesPage /> },
      { path: paths.imports, element: <ImportsPage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
