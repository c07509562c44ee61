/**
 * A sweep worker process (`server/worker.ts`, as `npm run worker` runs it) on
 * a given database, for the checks that need real ones beside the app:
 * e2e/sweeps-four-ways.spec.ts and `npm run bench:sweep:server`.
 */
import { spawn, type ChildProcess } from 'node:child_process'

/**
 * Starts the process and resolves once it takes chunks. Its log lines (pino
 * JSON, level info: one `chunk done` line per chunk with the process id) are
 * added to `lines` as they come.
 */
export function startWorkerProcess(databaseUrl: string, lines: string[] = []): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/worker.ts'], {
    env: { ...process.env, DATABASE_URL: databaseUrl, NODE_ENV: 'test', LOG_LEVEL: 'info' },
    stdio: ['ignore', 'pipe', 'inherit'],
  })
  return new Promise((resolve, reject) => {
    let buffered = ''
    child.stdout!.on('data', (d: Buffer) => {
      buffered += d.toString()
      const parts = buffered.split('\n')
      buffered = parts.pop() ?? ''
      lines.push(...parts)
      if (parts.some((l) => l.includes('taking sweep chunks'))) resolve(child)
    })
    child.on('exit', (code) => reject(new Error(`the worker exited with ${code}`)))
    setTimeout(() => reject(new Error('the worker did not start in 60 s')), 60_000).unref()
  })
}
