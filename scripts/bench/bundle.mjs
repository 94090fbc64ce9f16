#!/usr/bin/env node
// Bytes (gzip) of the JavaScript and CSS the first page loads, read from the build output.
import { readFileSync, existsSync } from 'node:fs'
import { gzipSync } from 'node:zlib'
import { resolve } from 'node:path'
import { root } from '../lib/deps.mjs'
import { ensureBuild } from '../lib/build.mjs'
import { benchServer, printTable } from './lib.mjs'

ensureBuild()
const server = await benchServer('bundle')
try {
  const html = await (await fetch(`${server.baseUrl}/login`)).text()
  const assets = [...html.matchAll(/(?:src|href)="(\/_nuxt\/[^"]+\.(?:js|css))"/g)].map((m) => m[1])
  const rows = []
  let js = 0
  let css = 0
  for (const a of new Set(assets)) {
    const file = resolve(root, '.output/public', a.slice(1))
    if (!existsSync(file)) continue
    const gz = gzipSync(readFileSync(file)).length
    if (a.endsWith('.js')) js += gz
    else css += gz
    rows.push({ asset: a, 'gzip bytes': gz })
  }
  rows.push({ asset: 'total JS', 'gzip bytes': js }, { asset: 'total CSS', 'gzip bytes': css })
  printTable('First page (/login) assets', rows)
} finally {
  await server.stop()
}
