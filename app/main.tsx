/** The page's entry point: open the stored design (or the example) and mount the editor. */
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './App.tsx';
import { boot } from './boot.ts';

const root = document.getElementById('root');
if (root === null) throw new Error('index.html has no #root element');
const { store, saver } = await boot();
createRoot(root).render(
  <StrictMode>
    <App store={store} saver={saver} />
  </StrictMode>,
);
