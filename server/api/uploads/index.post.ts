import { uploadQuery } from '#shared/schemas/uploads'

// The request body is the file itself; `?name=` keeps its file name for display.
export default defineEventHandler(async (event) => {
  const member = await requireMember(event)
  const { name } = validQuery(event, uploadQuery)
  const upload = await receiveUpload(event, member, { fileName: name ?? null })
  setResponseStatus(event, 201)
  return { id: upload.id, contentType: upload.contentType, sizeBytes: upload.sizeBytes, fileName: upload.fileName, createdAt: upload.createdAt }
})
