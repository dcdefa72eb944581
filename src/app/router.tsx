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
import { SearchPage } from '@/features/search/components/search-page';
import { ChecklistsPage } from '@/features/search/components/checklists-page';
import { ChecklistPage } from '@/features/search/components/checklist-page';
import { ChecklistPrintoutPage } from '@/features/search/components/checklist-printout-page';
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
      { path: '/prints/:id', element: <PrintRecordPage /> },
      { path: '/prints/:id/edit', element: <PrintEditPage /> },
      { path: paths.papers, element: <PapersPage /> },
      { path: paths.negatives, element: <NegativesPage /> },
      { path: paths.places, element: <PlacesPage /> },
      { path: paths.search, element: <SearchPage /> },
      { path: paths.checklists, element: <ChecklistsPage /> },
      { path: '/checklists/:id', element: <ChecklistPage /> },
      { path: '/checklists/:id/printout', element: <ChecklistPrintoutPage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
