// Renderer entry: picks the host (desktop preload or browser) and mounts the app.

import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/App';
import { pickHost } from './host/pick-host';
import './styles.css';

const VERSION = '0.1.0';

const root = document.getElementById('root');
if (!root) throw new Error('renderer: #root is missing from index.html');
createRoot(root).render(
  <StrictMode>
    <App host={pickHost(VERSION)} version={VERSION} />
  </StrictMode>,
);
