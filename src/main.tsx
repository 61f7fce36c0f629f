import '@fontsource/ibm-plex-sans/400.css';
import '@fontsource/ibm-plex-sans/500.css';
import '@fontsource/ibm-plex-sans/600.css';
import '@fontsource/ibm-plex-sans/700.css';
import './index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from './app/provider';
import { AppRouter } from './app/router';
import { startOutbox } from './lib/outbox/start-outbox';
import { registerServiceWorker } from './lib/service-worker';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

// The service worker's install (it fetches the whole shell) and the outbox's first look at IndexedDB wait
// until the page has loaded and the main thread is free: on a weak signal and a busy phone they would
// otherwise compete with the first screen.
window.addEventListener(
  'load',
  () => {
    const start = () => {
      registerServiceWorker();
      startOutbox();
    };
    if ('requestIdleCallback' in window) requestIdleCallback(start, { timeout: 2000 });
    else setTimeout(start);
  },
  { once: true },
);

createRoot(root).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
    </AppProvider>
  </StrictMode>,
);
