import fs from 'node:fs'
import { projectRoot } from './db/cluster'

/** The app version, from package.json. */
export const appVersion: string = (JSON.parse(fs.readFileSync(`${projectRoot}/package.json`, 'utf8')) as { version: string }).version
