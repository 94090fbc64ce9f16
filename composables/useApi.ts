import type { FetchError } from 'ofetch'

export interface ApiErrorData { fields?: Record<string, string>, retryAfterSeconds?: number }

// The server's message for a failed request, and its per-field messages when it sent them.
export function apiError(err: unknown): { message: string, fields: Record<string, string>, status?: number } {
  const e = err as FetchError<{ message?: string, data?: ApiErrorData }>
  const status = e?.statusCode ?? e?.response?.status
  const message = e?.data?.message || e?.statusMessage || (status ? `Request failed (${status})` : 'Could not reach the server')
  return { message, fields: e?.data?.data?.fields ?? {}, status }
}

// User actions go through here so every API error reaches the user as a toast with the server's words.
export function useApi() {
  const toast = useToast()
  async function call<T>(url: string, options: Parameters<typeof $fetch>[1] = {}): Promise<T> {
    try {
      return await ($fetch as unknown as (u: string, o: unknown) => Promise<T>)(url, options)
    } catch (err) {
      const { message, status } = apiError(err)
      if (status === 401 && import.meta.client) {
        await navigateTo('/login')
      }
      toast.error(message)
      throw err
    }
  }
  return { call, apiError }
}
