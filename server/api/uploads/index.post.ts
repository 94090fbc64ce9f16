import { uploadQuery } from '#shared/schemas/uploads'

const ACCEPT = { any: UPLOAD_TYPES, photo: ['image/jpeg', 'image/png', 'image/webp'], csv: ['text/csv'] } as const

// The request body is the file itself; `?name=` keeps its file name, `?kind=photo|csv` narrows the types.
export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { name, kind } = validQuery(event, uploadQuery)
  const upload = await receiveUpload(event, member, { fileName: name ?? null, accept: ACCEPT[kind] })
  setResponseStatus(event, 201)
  return { id: upload.id, contentType: upload.contentType, sizeBytes: upload.sizeBytes, fileName: upload.fileName, createdAt: upload.createdAt }
})
