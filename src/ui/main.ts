// The web page's entry point (index.html loads it after public/csp-setup.js; the styles are linked
// from index.html). Importing earlyPool starts the solver workers before the page is built. It is the
// first import: modules run in import order, so the workers are spawned before the page's other
// modules (the controls, plots, schemas) are evaluated, about 100-130 ms of the first load.
// biome-ignore assist/source/organizeImports: earlyPool must be evaluated first (see above)
import { pool } from './earlyPool';
import { App } from './app';
import { readDurable } from './durableAutosave';

function showStartError(error: unknown): void {
  document.body.dataset.state = 'error';
  const box = document.getElementById('messages');
  if (box) {
    const div = document.createElement('div');
    div.className = 'message error';
    div.setAttribute('role', 'alert');
    div.textContent = `The page could not start: ${error instanceof Error ? error.message : String(error)}`;
    box.append(div);
  }
}

// The autosave's durable copy is read first (a few ms; at most 1 s), while the workers load.
void readDurable().then((durable) => {
  try {
    new App(pool, durable).start().catch((error: unknown) => {
      showStartError(error);
      throw error;
    });
  } catch (error) {
    showStartError(error);
    throw error;
  }
});
