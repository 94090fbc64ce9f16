#!/usr/bin/env node
import { createJiti } from 'jiti'

const jiti = createJiti(import.meta.url)
const { seedDemo } = await jiti.import('./seed/index.ts')
const url = process.env.DATABASE_URL
if (!url) {
  console.error('DATABASE_URL is required')
  process.exit(2)
}
console.log((await seedDemo(url)) ? '[rowbench] demo data seeded' : '[rowbench] database has data; demo seed skipped')
