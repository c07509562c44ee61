import { reactive, ref, watch } from 'vue'
import type { FormInst, FormItemRule } from 'naive-ui'
import type { ZodType } from 'zod'
import { ApiError } from '@/api'

/**
 * An NForm rule from a shared zod schema, so that the form and the server
 * reject the same values with the same words. An empty input counts as a
 * missing value, so the schema's "is required" message shows for it.
 */
export function zodRule(schema: ZodType, trigger: string[] = ['blur', 'input']): FormItemRule {
  return {
    trigger,
    validator: (_rule: FormItemRule, value: unknown) => {
      const result = schema.safeParse(value === '' ? undefined : value)
      return result.success ? true : new Error(result.error.issues[0]?.message ?? 'Not valid')
    },
  }
}

/** A rule from a check of our own: `check` returns the message, or null when the value is fine. */
export function checkRule(check: (value: string) => string | null, trigger: string[] = ['blur', 'input']): FormItemRule {
  return {
    trigger,
    validator: (_rule: FormItemRule, value: unknown) => {
      const problem = check(typeof value === 'string' ? value : '')
      return problem === null ? true : new Error(problem)
    },
  }
}

/**
 * State of a form that is sent to the API: client-side validation first, then
 * the server's answer: its `fields` next to their inputs, its message above.
 * A field's server error goes away as soon as its value is edited.
 */
export function useServerForm<M extends Record<string, string>>(model: M) {
  const formRef = ref<FormInst | null>(null)
  const submitting = ref(false)
  const formError = ref<string | null>(null)
  const fieldErrors = reactive<Record<string, string>>({})

  for (const key of Object.keys(model)) {
    watch(
      () => model[key],
      () => {
        delete fieldErrors[key]
      },
    )
  }

  /** Props for an NFormItem: the server's message for `field`, if any. */
  function serverFeedback(field: keyof M & string) {
    const message = fieldErrors[field]
    return message ? { feedback: message, validationStatus: 'error' as const } : {}
  }

  /** Validates, then runs `action`; resolves true when it succeeded. */
  async function submit(action: () => Promise<void>): Promise<boolean> {
    formError.value = null
    try {
      await formRef.value?.validate()
    } catch {
      return false // NForm shows the messages
    }
    submitting.value = true
    try {
      await action()
      return true
    } catch (err) {
      for (const key of Object.keys(fieldErrors)) delete fieldErrors[key]
      if (err instanceof ApiError) {
        Object.assign(fieldErrors, err.fields)
        formError.value = err.message
      } else {
        formError.value = 'Something went wrong in the page. Reload it and try again.'
      }
      return false
    } finally {
      submitting.value = false
    }
  }

  return { formRef, submitting, formError, fieldErrors, serverFeedback, submit }
}
