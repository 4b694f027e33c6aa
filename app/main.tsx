/**
 * The page's entry point. For now it shows the start page: the example design checked in the
 * browser by the same engine as `railcross check`; the editor takes its place later.
 */
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { StartPage } from './StartPage.tsx';
import './start.css';

const root = document.getElementById('root');
if (root === null) throw new Error('index.html has no #root element');
createRoot(root).render(
  <StrictMode>
    <StartPage />
  </StrictMode>,
);
