import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import '@fontsource/jetbrains-mono/400.css';
import '@fontsource/jetbrains-mono/600.css';
import './styles.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { RouterProvider } from 'react-router/dom';
import { Providers } from './app/providers';
import { queryClient } from './app/query-client';
import { createAppRouter } from './app/entry-router';

const element = document.getElementById('root');
if (!element) throw new Error('index.html has no #root element');
const root = createRoot(element);

// The router (its first match, loaders and route discovery) starts in a task of its own, not in
// the one that runs the entry's code (React DOM, React Router and the frame: one long task).
setTimeout(() => {
  const router = createAppRouter(queryClient);
  root.render(
    <StrictMode>
      <Providers client={queryClient}>
        <RouterProvider router={router} />
      </Providers>
    </StrictMode>,
  );
}, 0);
