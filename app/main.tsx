// Browser entry point: mounts the Lobewright client into #root.
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProvider } from './provider';
import { AppRouter } from './router';
import './styles.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html must contain an element with id "root"');

createRoot(root).render(
  <StrictMode>
    <AppProvider>
      <AppRouter />
    </AppProvider>
  </StrictMode>,
);
