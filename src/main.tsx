import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router/dom';
import { AppProvider, createQueryClient } from './app/provider';
import { AppUpdate } from './app/pwa/app-update';
import { createAppRouter } from './app/router';
import './index.css';

const queryClient = createQueryClient();
const router = createAppRouter(queryClient);

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
      <AppUpdate />
    </AppProvider>
  </StrictMode>,
);
