// The client application: providers around the browser router.
import { useState } from 'react';
import { createBrowserRouter, RouterProvider } from 'react-router-dom';
import { AppProvider } from './provider';
import { appRoutes } from './router';

export function App() {
  const [router] = useState(() => createBrowserRouter(appRoutes));
  return (
    <AppProvider>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
