import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import './styles.css';
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { createApp } from './app/app';

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no element with id "root" to mount Gelpoint into.');

createRoot(container).render(<StrictMode>{createApp()}</StrictMode>);
