import { createBrowserRouter } from 'react-router-dom';
import { AppShell } from '../components/AppShell.tsx';
import { HomePage } from './HomePage.tsx';
import { NotFoundPage } from './NotFoundPage.tsx';
import { paths } from './paths.ts';

/** The data router: one layout (the app shell) around every page; heavy pages are lazy. */
export const router = createBrowserRouter([
  {
    element: <AppShell />,
    children: [
      { path: paths.home, element: <HomePage /> },
      { path: '*', element: <NotFoundPage /> },
    ],
  },
]);
