#!/usr/bin/env node
// npm test: install what is missing, then run the suites and print one summary line.
import { ensureDependencies } from './lib/deps.mjs'
import { runSuites } from './lib/suites.mjs'

ensureDependencies()
const code = await runSuites()
process.exit(code)
