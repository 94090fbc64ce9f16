import { idParams } from '#shared/schemas/common'

export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { id } = validParams(event, idParams)
  const { upload, bytes } = await readUpload(member.farmId, id)
  const ext = { 'text/csv': 'csv', 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' }[upload.contentType] ?? 'bin'
  setResponseHeaders(event, {
    'Content-Type': upload.contentType === 'text/csv' ? 'text/csv; charset=utf-8' : upload.contentType,
    'Content-Length': String(bytes.length),
    'Content-Disposition': `${upload.contentType.startsWith('image/') ? 'inline' : 'attachment'}; filename="upload-${upload.id}.${ext}"`,
    'Cache-Control': 'private, max-age=3600',
  })
  return bytes
})
