import { render } from 'preact';
import { App } from './App';

// Office.js is only usable once the host has initialised it; rendering earlier
// would let later pane code call into an unready API.
Office.onReady(() => {
  const root = document.getElementById('root');
  if (root) render(<App />, root);
});
