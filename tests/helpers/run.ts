/**
 * Runs a command without blocking the test worker and without a shell. Resolves with its output;
 * a non-zero exit rejects with an error that carries both stdout and stderr (tsc, publint and attw
 * report their findings on stdout, which Node's own error message leaves out).
 */
import { execFile } from 'node:child_process';

export interface RunOptions {
  cwd: string;
  timeout?: number;
  env?: NodeJS.ProcessEnv;
}

export function runCommand(file: string, args: string[], options: RunOptions): Promise<{ stdout: string; stderr: string }> {
  return new Promise((resolve, reject) => {
    execFile(file, args, { ...options, encoding: 'utf8', maxBuffer: 64 << 20 }, (error, stdout, stderr) => {
      if (error) reject(new Error(`${[file, ...args].join(' ')} failed (${error.code ?? error.signal ?? error.message}):\n${stdout}${stderr}`));
      else resolve({ stdout, stderr });
    });
  });
}
