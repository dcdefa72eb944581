import '@fontsource/eb-garamond/400.css';
import '@fontsource/eb-garamond/500.css';
import '@fontsource/eb-garamond/600.css';
import '@fontsource/eb-garamond/400-italic.css';
import './index.css';
import { startTransition, StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from './app/provider';
import { AppRouter } from './app/router';

// The first render as a transition: React draws it in slices of a few milliseconds, so the
// page stays able to take a tap or a key while the app starts, instead of one long task.
const root = createRoot(document.getElementById('root')!);
startTransition(() => {
  root.render(
    <StrictMode>
      <AppProvider>
        <AppRouter />
      </AppProvider>
    </StrictMode>,
  );
});
