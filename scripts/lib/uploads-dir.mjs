// Where the uploaded files live on disk and where their archive sits beside a database dump.
import { resolve } from 'node:path'
import { root } from './deps.mjs'

// The same folder the server uses: NUXT_UPLOAD_DIR, else .data/uploads (scripts/start.mjs).
export function uploadsDir() {
  return resolve(root, process.env.NUXT_UPLOAD_DIR || '.data/uploads')
}

// rowbench-<stamp>.dump → rowbench-<stamp>.uploads.tar.gz
export function uploadsArchiveFor(dumpFile) {
  return `${dumpFile.replace(/\.dump$/, '')}.uploads.tar.gz`
}
