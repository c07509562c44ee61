/// <reference lib="webworker" />
/**
 * The simulator Web Worker: the whole pipeline off the page's thread.
 * Created by src/composables/useSimulator.ts.
 */
import * as Comlink from 'comlink'
import { createSimulatorService } from './simulatorService'

Comlink.expose(createSimulatorService())
