/** Run the real command (bin/coversweep.mjs) in a child process, with a time bound. */
import { type StdioOptions, spawn } from 'node:child_process';
import { resolve } from 'node:path';

export const BIN = resolve(__dirname, '../../bin/coversweep.mjs');

export interface ProcessRun {
  code: number | null;
  signal: NodeJS.Signals | null;
  stdout: string;
  stderr: string;
  hung: boolean;
}

export function cliProcess(
  args: string[],
  cwd: string,
  options: { stdio?: StdioOptions; boundMs?: number; shell?: string } = {},
): Promise<ProcessRun> {
  return new Promise((done, fail) => {
    const child = options.shell
      ? spawn('sh', ['-c', options.shell], { cwd, stdio: options.stdio ?? 'pipe' })
      : spawn(process.execPath, [BIN, ...args], { cwd, stdio: options.stdio ?? 'pipe' });
    let stdout = '';
    let stderr = '';
    let hung = false;
    child.stdout?.on('data', (c: Buffer) => {
      stdout += c.toString();
    });
    child.stderr?.on('data', (c: Buffer) => {
      stderr += c.toString();
    });
    const timer = setTimeout(() => {
      hung = true;
      child.kill('SIGKILL');
    }, options.boundMs ?? 60_000);
    child.on('error', fail);
    child.on('close', (code, signal) => {
      clearTimeout(timer);
      done({ code, signal, stdout, stderr, hung });
    });
  });
}
