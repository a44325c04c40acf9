// Browser entry: start the workbench (store, autosave, engine worker) and render the shell.
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from '@/app/App';
import { createEngineWorker } from '@/app/createEngineWorker';
import { startWorkbench } from '@/app/startWorkbench';

const workbench = startWorkbench(window.localStorage, createEngineWorker);
window.addEventListener('pagehide', () => workbench.autosave.flush());

createRoot(document.getElementById('root')!).render(
  <StrictMode>
    <App workbench={workbench} />
  </StrictMode>,
);
