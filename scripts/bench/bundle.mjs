#!/usr/bin/env node
// Bytes (gzip) of the JavaScript and CSS the first page loads, read from the build output: scripts,
// module preloads and style sheets; chunks the page only prefetches when idle are counted apart.
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
  const tags = [...html.matchAll(/<(?:link|script)\b[^>]*>/g)].map((m) => m[0])
  const urlOf = (tag) => /(?:src|href)="(\/_nuxt\/[^"]+\.(?:js|css))"/.exec(tag)?.[1]
  const loaded = new Set(tags.filter((t) => !/rel="prefetch"/.test(t)).map(urlOf).filter(Boolean))
  const prefetched = new Set(tags.filter((t) => /rel="prefetch"/.test(t)).map(urlOf).filter((u) => u && !loaded.has(u)))
  const gzipOf = (a) => {
    const file = resolve(root, '.output/public', a.slice(1))
    return existsSync(file) ? gzipSync(readFileSync(file)).length : 0
  }
  const rows = []
  let js = 0
  let css = 0
  for (const a of loaded) {
    const gz = gzipOf(a)
    if (a.endsWith('.js')) js += gz
    else css += gz
    rows.push({ asset: a, 'gzip bytes': gz })
  }
  const idle = [...prefetched].reduce((n, a) => n + gzipOf(a), 0)
  rows.push({ asset: 'total JS', 'gzip bytes': js }, { asset: 'total CSS', 'gzip bytes': css }, { asset: `prefetched when idle (${prefetched.size} chunks)`, 'gzip bytes': idle })
  printTable('First page (/login) assets', rows)
} finally {
  await server.stop()
}
