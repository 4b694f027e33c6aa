/**
 * The page's entry point: show that the editor is opening, open storage and the first design,
 * then mount the editor. Reading and checking a large design takes a few hundred
 * milliseconds; the page says so rather than staying blank.
 */
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { setMeasureVars } from './canvas/chipLayout.ts';
import { Root } from './session/Root.tsx';
import { startSession } from './session/start.ts';

// The chips' measures, from the numbers the canvas lays out and routes by (styles.css reads them).
setMeasureVars(document.documentElement);
const element = document.getElementById('root');
if (element === null) throw new Error('index.html has no #root element');
const root = createRoot(element);
root.render(
  <p className="rc-opening" role="status">
    Opening your designs…
  </p>,
);
const session = await startSession();
// `npm run bench:ui` drives the editor through this hook; without `?bench` its chunk is never loaded.
if (new URLSearchParams(location.search).has('bench')) (await import('./bench/benchHooks.ts')).exposeForBench(session);
root.render(
  <StrictMode>
    <Root session={session} />
  </StrictMode>,
);
