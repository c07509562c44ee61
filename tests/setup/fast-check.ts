/**
 * Property tests run with one fixed seed so that a CI run is reproducible and
 * a failure can be replayed. Explore other seeds locally: FC_SEED=123 npx vitest run
 * (fast-check prints the seed and the shrunk counterexample of any failure).
 */
import fc from 'fast-check'

const seed = Number(process.env.FC_SEED ?? 20261201)
if (!Number.isSafeInteger(seed)) throw new Error(`FC_SEED must be an integer (got "${process.env.FC_SEED}")`)
fc.configureGlobal({ seed })
