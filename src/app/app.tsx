import { RouterProvider } from 'react-router-dom';
import { AppProvider } from './provider';
import { router } from './router';

/** The whole client: providers around the router. */
export function App() {
  return (
    <AppProvider>
      <RouterProvider router={router} />
    </AppProvider>
  );
}
