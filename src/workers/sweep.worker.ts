/// <reference lib="webworker" />
/**
 * A sweep Web Worker: runs points of a sweep off the page's thread. The pool
 * (src/workers/sweepPool.ts) starts one per core the browser reports.
 */
import * as Comlink from 'comlink'
import { createSweepService } from './sweepService'

Comlink.expose(createSweepService())
