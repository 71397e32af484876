import { useCallback, useState } from 'react';
import type { ZodType, output } from 'zod';
import { ApiError } from '@/hooks/api-client';
import { fieldMessages } from './field-errors';

/** The keys of a form's values that hold text. */
type StringKeys<V> = { [K in keyof V]: V[K] extends string ? K : never }[keyof V] & string;

/**
 * Form state checked with the same zod schema the server uses.
 * `values` hold what the fields show (strings for text inputs); `toInput`
 * turns them into what the schema reads (numbers, unit conversions).
 * Field messages come from the schema on submit, or from the API's
 * `details.fields` after a refusal; a message for the whole form from
 * anything else.
 */
export function useZodForm<V extends Record<string, unknown>, S extends ZodType>(
  schema: S,
  initial: V,
  toInput: (values: V) => unknown = (v) => v,
) {
  const [values, setValues] = useState<V>(initial);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [formError, setFormError] = useState<string | undefined>();

  const setValue = useCallback(<K extends keyof V>(key: K, value: V[K]) => {
    setValues((prev) => ({ ...prev, [key]: value }));
    setErrors((prev) => {
      if (!(key in prev)) return prev;
      const next = { ...prev };
      delete next[key as string];
      return next;
    });
  }, []);

  /** Parsed values when valid; otherwise shows the field messages and answers undefined. */
  const validate = (): output<S> | undefined => {
    const parsed = schema.safeParse(toInput(values));
    setFormError(undefined);
    if (parsed.success) {
      setErrors({});
      return parsed.data;
    }
    const fields = fieldMessages(parsed.error);
    setErrors(fields);
    if (fields._) setFormError(fields._);
    return undefined;
  };

  /** Shows an API refusal: field messages beside fields, the rest above the button. */
  const showError = (err: unknown) => {
    if (err instanceof ApiError) {
      setErrors(err.fields);
      const fieldTexts = Object.values(err.fields);
      setFormError(fieldTexts.includes(err.message) ? undefined : err.message);
    } else {
      setFormError('Something went wrong. Try again.');
    }
  };

  /** Props binding a text field to one string value: what it shows, its change handler and its message. */
  const field = <K extends StringKeys<V>>(key: K) => ({
    value: values[key] as string,
    onChangeText: (v: string) => setValue(key, v as V[K]),
    error: errors[key],
  });

  return { values, setValue, setValues, errors, formError, validate, showError, field };
}
