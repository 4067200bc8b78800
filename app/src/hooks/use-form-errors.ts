import { useState } from 'react';
import { isApiError } from '@/lib/api-client';

export type FieldErrors<F extends string> = Partial<Record<F, string>>;

/**
 * A form's field errors: the client's own checks, and the server's `fields` (an array field's
 * `name[0]` counts for `name`). A server error that names none of `fieldNames` is `formError`, for
 * above the form.
 */
export function useFormErrors<F extends string>(
  fieldNames: readonly F[],
  serverError: Error | null,
) {
  const [errors, setErrors] = useState<FieldErrors<F>>({});
  const serverFields = isApiError(serverError) ? serverError.fields : undefined;
  const serverMessage = (name: F) =>
    Object.entries(serverFields ?? {}).find(
      ([key]) => key === name || key.startsWith(`${name}[`),
    )?.[1];
  const namesAField = fieldNames.some((name) => serverMessage(name) !== undefined);
  const message = (name: F) => errors[name] ?? serverMessage(name);

  return {
    setErrors,
    clearError: (name: F) => setErrors((previous) => ({ ...previous, [name]: undefined })),
    formError: serverError && !namesAField ? serverError.message : undefined,
    /** `validationMessage` and `validationState` for the Fluent `Field` of `name`. */
    fieldProps: (name: F) => ({
      validationMessage: message(name),
      validationState: message(name) ? ('error' as const) : ('none' as const),
    }),
  };
}
