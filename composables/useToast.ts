export interface Toast { id: number, kind: 'error' | 'success' | 'info', text: string }

// One toast queue per app instance (useState keeps it per request on the server).
export function useToast() {
  const toasts = useState<Toast[]>('toasts', () => [])
  let seq = 0
  function push(kind: Toast['kind'], text: string, ms = 5000) {
    const id = Date.now() + seq++
    toasts.value = [...toasts.value, { id, kind, text }]
    if (import.meta.client) setTimeout(() => dismiss(id), ms)
  }
  function dismiss(id: number) {
    toasts.value = toasts.value.filter((t) => t.id !== id)
  }
  return {
    toasts,
    dismiss,
    error: (text: string) => push('error', text, 8000),
    success: (text: string) => push('success', text),
    info: (text: string) => push('info', text),
  }
}
