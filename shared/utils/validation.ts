import type { z } from 'zod'

// One message per dotted field path ("stages.0.driverTeeth"), the first issue winning; each unknown
// field is named on its own path; an issue on the whole body goes under "_".
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {}
  for (const issue of error.issues) {
    const base = issue.path.map(String).join('.')
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) fields[base ? `${base}.${key}` : key] = 'Unknown field'
      continue
    }
    const path = base || '_'
    if (!fields[path]) fields[path] = issue.message
  }
  return fields
}
