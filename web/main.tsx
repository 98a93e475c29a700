import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
// Fonts ship with the app (nothing loads from a CDN): Merriweather for document text, Inter for the UI.
import '@fontsource/merriweather/400.css';
import '@fontsource/merriweather/400-italic.css';
import '@fontsource/merriweather/700.css';
import '@fontsource/inter/400.css';
import '@fontsource/inter/500.css';
import '@fontsource/inter/600.css';
import './styles.css';
import { App } from './app/app';

const root = document.getElementById('root');
if (!root) throw new Error('The page has no #root element');

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
