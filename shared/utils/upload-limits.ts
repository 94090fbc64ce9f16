// Limits the server enforces on uploads and that the pages check before sending.
export const UPLOAD_MAX_BYTES = 10 * 1024 * 1024
export const MAX_PHOTOS_PER_RECORD = 10
