// Browser entry: fonts and styles from the bundle (nothing from the network), then the app.
import '@fontsource/ibm-plex-sans/400.css';
import '@fontsource/ibm-plex-sans/500.css';
import '@fontsource/ibm-plex-sans/600.css';
import './index.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/app';

const root = document.getElementById('root');
if (!root) throw new Error('index.html must contain <div id="root">.');

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
