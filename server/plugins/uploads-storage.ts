import { resolve } from 'node:path'
import fsDriver from 'unstorage/drivers/fs'

// Mounts the `uploads` storage on the directory the runtime gives (NUXT_UPLOAD_DIR), so each
// instance and test server keeps files where it is told. NUXT_UPLOAD_STORAGE=config keeps the
// mount from nuxt.config.ts (for example an object-storage driver) instead.
export default defineNitroPlugin(() => {
  const config = useRuntimeConfig()
  if (config.uploadStorage === 'config' || !config.uploadDir) return
  const storage = useStorage()
  // Without disposing, unmount takes effect at once (no await before it removes the mount).
  void storage.unmount('uploads', false)
  storage.mount('uploads', fsDriver({ base: resolve(String(config.uploadDir)) }))
})
