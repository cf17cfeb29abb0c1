/**
 * Runs a command without blocking the test worker and without a shell. Resolves with its output;
 * a non-zero exit rejects with an error that carries both stdout and stderr (tsc, publint and attw
 * report their findings on stdout, which Node's own error message leaves out).
 *
 * `background: true` lowers the command's scheduling priority (nice 5) for work nothing else waits
 * on (the type check, the API reference), so that the one build of dist/, which the other
 * integration tests wait for, gets the CPU first on a small machine. It changes no result.
 */
import { execFile } from 'node:child_process';
import { setPriority } from 'node:os';

export interface RunOptions {
  cwd: string;
  timeout?: number;
  env?: NodeJS.ProcessEnv;
  background?: boolean;
}

export function runCommand(file: string, args: string[], options: RunOptions): Promise<{ stdout: string; stderr: string }> {
  const { background, ...rest } = options;
  return new Promise((resolve, reject) => {
    const child = execFile(file, args, { ...rest, encoding: 'utf8', maxBuffer: 64 << 20 }, (error, stdout, stderr) => {
      if (error) reject(new Error(`${[file, ...args].join(' ')} failed (${error.code ?? error.signal ?? error.message}):\n${stdout}${stderr}`));
      else resolve({ stdout, stderr });
    });
    if (background && child.pid !== undefined) {
      try {
        setPriority(child.pid, 5);
      } catch {
        // not permitted here: run at normal priority
      }
    }
  });
}
