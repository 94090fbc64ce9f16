import useVuelidate from '@vuelidate/core'
import { helpers } from '@vuelidate/validators'
import type { z } from 'zod'

// Vuelidate rules built from the same zod schema the server enforces, plus the server's own
// per-field messages after a rejected submit.
export function useSchemaForm<S extends z.ZodObject>(schema: S, state: Record<string, unknown>) {
  const serverErrors = ref<Record<string, string>>({})
  const shape = schema.shape as Record<string, z.ZodType>
  const rules = Object.fromEntries(Object.keys(shape).map((key) => {
    const check = (value: unknown) => shape[key]!.safeParse(value === '' ? undefined : value).success
    const message = ({ $model }: { $model: unknown }) => shape[key]!.safeParse($model === '' ? undefined : $model).error?.issues[0]?.message ?? 'Check this value'
    return [key, { schema: helpers.withMessage(message, check) }]
  }))
  const v$ = useVuelidate(rules, state)

  function errorOf(key: string): string {
    const field = (v$.value as unknown as Record<string, { $dirty: boolean, $errors: { $message: unknown }[] }>)[key]
    if (field?.$dirty && field.$errors.length) return String(field.$errors[0]!.$message)
    return serverErrors.value[key] ?? ''
  }

  async function validate() {
    serverErrors.value = {}
    return v$.value.$validate()
  }

  function takeServerErrors(err: unknown) {
    serverErrors.value = apiError(err).fields
  }

  // Checks the form (unless told not to), then runs the request with `busy` set; a refusal's field
  // messages land beside their fields, its message in the toast.
  const busy = ref(false)
  async function submit(action: () => Promise<unknown>, options: { validateFirst?: boolean } = {}) {
    if (options.validateFirst !== false && !(await validate())) return
    busy.value = true
    try {
      await action()
    } catch (err) {
      takeServerErrors(err)
    } finally {
      busy.value = false
    }
  }

  return { v$, errorOf, validate, takeServerErrors, busy, submit }
}
