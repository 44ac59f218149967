/** Helpers of the browser tests: a free local port, and waiting for `vite preview` to answer. */
import type { ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';

export function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const srv = createServer();
    srv.once('error', fail);
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      srv.close(() => ok(port));
    });
  });
}

export async function waitForServer(url: string, child: ChildProcess, log: () => string): Promise<void> {
  for (let i = 0; i < 300; i++) {
    if (child.exitCode !== null) throw new Error(`vite preview exited early:\n${log()}`);
    try {
      const r = await fetch(url);
      if (r.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((ok) => setTimeout(ok, 100));
  }
  throw new Error(`vite preview did not answer at ${url}:\n${log()}`);
}
