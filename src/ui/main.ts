// The web page's entry point (index.html loads it).
import 'uplot/dist/uPlot.min.css';
import './styles.css';
import { App } from './app';

try {
  new App().start();
} catch (error) {
  document.body.dataset.state = 'error';
  const box = document.getElementById('messages');
  if (box) {
    const div = document.createElement('div');
    div.className = 'message error';
    div.setAttribute('role', 'alert');
    div.textContent = `The page could not start: ${error instanceof Error ? error.message : String(error)}`;
    box.append(div);
  }
  throw error;
}
