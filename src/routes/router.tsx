import { createBrowserRouter } from 'react-router-dom';
import { AppShell } from '../components/AppShell.tsx';
import { RequireSignIn } from '../components/RequireSignIn.tsx';
import { HomePage } from './HomePage.tsx';
import { NotFoundPage } from './NotFoundPage.tsx';
import { RegisterPage } from './RegisterPage.tsx';
import { ResetPasswordPage } from './ResetPasswordPage.tsx';
import { SignInPage } from './SignInPage.tsx';
import { paths } from './paths.ts';

/** The data router: one layout (the app shell) around every page; heavy pages are lazy. */
export const router = createBrowserRouter([
  {
    element: <AppShell />,
    children: [
      { path: paths.home, element: <HomePage /> },
      { path: paths.signIn, element: <SignInPage /> },
      { path: paths.register, element: <RegisterPage /> },
      { path: paths.resetPassword, element: <ResetPasswordPage /> },
      {
        element: <RequireSignIn />,
        children: [
          { path: paths.workshops, lazy: async () => ({ Component: (await import('./WorkshopsIndexPage.tsx')).WorkshopsIndexPage }) },
          { path: paths.workshop, lazy: async () => ({ Component: (await import('./WorkshopPage.tsx')).WorkshopPage }) },
          { path: paths.newDesign, lazy: async () => ({ Component: (await import('./NewDesignPage.tsx')).NewDesignPage }) },
          { path: paths.design, lazy: async () => ({ Component: (await import('./DesignEditorPage.tsx')).DesignEditorPage }) },
          { path: paths.materials, lazy: async () => ({ Component: (await import('./MaterialsPage.tsx')).MaterialsPage }) },
          { path: paths.compare, lazy: async () => ({ Component: (await import('./ComparePage.tsx')).ComparePage }) },
        ],
      },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
