import { MAX_PHOTOS_PER_RECORD, UPLOAD_MAX_BYTES } from '#shared/utils/upload-limits'

// Uploads chosen pictures one by one as photos and returns their ids; files over the limit are
// named in a toast and left out, and no more are sent than the record still has room for. A failed
// upload throws (its toast already shown) after `onUploaded` has seen the ones sent before it.
export function usePhotoUpload() {
  const { call } = useApi()
  const toast = useToast()
  const busy = ref(false)

  async function upload(files: FileList | File[] | null | undefined, alreadyAttached: number, onUploaded?: (id: number) => void): Promise<number[]> {
    const chosen = Array.from(files ?? []).slice(0, Math.max(0, MAX_PHOTOS_PER_RECORD - alreadyAttached))
    const ids: number[] = []
    if (!chosen.length) return ids
    busy.value = true
    try {
      for (const file of chosen) {
        if (file.size > UPLOAD_MAX_BYTES) {
          toast.error(`${file.name} is larger than 10 MB`)
          continue
        }
        const { id } = await call<{ id: number }>('/api/uploads', { method: 'POST', body: file, query: { name: file.name, kind: 'photo' } })
        ids.push(id)
        onUploaded?.(id)
      }
    } finally {
      busy.value = false
    }
    return ids
  }

  return { busy, upload, MAX_PHOTOS: MAX_PHOTOS_PER_RECORD }
}
