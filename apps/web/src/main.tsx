import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import './styles.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { registerSW } from 'virtual:pwa-register';
import { createApp } from './app/app';

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no element with id "root" to mount Gelpoint into.');

// The service worker keeps the app's files for offline use; a new build takes over at once (the stored pages of the
// old one are dropped by their build id).
registerSW({ immediate: true });

void createApp().then((app) => createRoot(container).render(<StrictMode>{app}</StrictMode>));
