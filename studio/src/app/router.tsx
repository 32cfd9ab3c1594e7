import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppLayout } from '@/components/layouts/app-layout';
import { RouteErrorView } from '@/components/error-view';
import { paths } from '@/config/paths';

// Routes load lazily so a reader never downloads the editor's code.
const router = createBrowserRouter([
  {
    element: <AppLayout />,
    errorElement: <RouteErrorView />,
    children: [
      { path: paths.home, lazy: async () => ({ Component: (await import('./routes/home')).HomeRoute }) },
      { path: paths.status, lazy: async () => ({ Component: (await import('./routes/status')).StatusRoute }) },
      { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }) },
    ],
  },
]);

export function AppRouter() {
  return <RouterProvider router={router} />;
}
