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
import { FixityPage } from '@/features/fixity/components/fixity-page';
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
      { path: paths.fixity, element: <FixityPage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
