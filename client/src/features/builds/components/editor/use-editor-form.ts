import { useEffect } from 'react';
import { useForm, type DefaultValues, type FieldErrors, type FieldValues } from 'react-hook-form';
import type { UseMutationResult } from '@tanstack/react-query';
import type { z } from 'zod';
import type { OwnerBuild } from '@shared/schemas/build';
import { ApiError } from '@client/lib/api';
import { formResolver, placeServerErrors, cleanValues, stableStringify } from './form-values';
import { useEditor, useStoreVersion, type FormKey } from './editor-stores';
import { useAutosave, type SendResult } from './use-autosave';
import type { PanelProps, SaveStatus } from './section-form';

/** Every message in a nested error object, each once, for the summary at the top of a form. */
export function errorMessages(error: unknown): string[] {
  if (!error || typeof error !== 'object') return [];
  const own = typeof (error as { message?: unknown }).message === 'string' ? [(error as { message: string }).message] : [];
  const nested = Object.entries(error).filter(([k]) => k !== 'ref' && k !== 'message' && k !== 'type').flatMap(([, v]) => errorMessages(v));
  return [...new Set([...own, ...nested].filter(Boolean))];
}

/** True when a saved value holds nothing: no text, no number, no list item. */
function saysNothing(value: unknown): boolean {
  if (value === undefined || value === null || value === '' || value === false) return true;
  if (Array.isArray(value)) return value.length === 0;
  if (typeof value === 'object') return Object.values(value).every(saysNothing);
  return false;
}

type Options<T extends FieldValues, S> = {
  formKey: FormKey;
  schema: z.ZodType;
  /** The form's values from the saved build (with blanks for empty boxes). */
  fromBuild: (build: OwnerBuild) => T;
  /** Form values → the request body (empty boxes dropped). */
  clean?: (values: T) => unknown;
  mutation: UseMutationResult<{ build: OwnerBuild }, Error, S>;
  /** Top-level field names, for placing the server's field errors. */
  fields: readonly string[];
};

/**
 * One section of the editor: its own form on the shared schema, saved by itself shortly after the
 * owner stops typing (Enter saves at once). It tells the editor where its edits stand and feeds its
 * live values to the numbers panel.
 */
export function useEditorForm<T extends FieldValues, S>({ formKey, schema, fromBuild, clean = cleanValues as (values: T) => unknown, mutation, fields }: Options<T, S>) {
  const { build, drafts, dirty } = useEditor();
  const saved = fromBuild(build);
  const savedValues = JSON.stringify(saved);
  // "Stored" means: what a save would send equals what is saved. (react-hook-form's own isDirty
  // also counts boxes that were never filled in, so it is not used.)
  const keyOf = (values: T) => stableStringify(clean(values));
  const form = useForm<T>({ resolver: formResolver<T>(schema, clean), defaultValues: saved as DefaultValues<T>, mode: 'onTouched', shouldFocusError: false });

  const send = async (data: T): Promise<SendResult> => {
    try {
      const { build: next } = await mutation.mutateAsync(data as unknown as S);
      return { stored: true, answerKey: keyOf(fromBuild(next)) };
    } catch (err) {
      placeServerErrors(err, form.setError, fields);
      // The server's field errors say why (they name the field); otherwise its message.
      const fieldMessages = err instanceof ApiError ? [...new Set(Object.values(err.fields))] : [];
      return { stored: false, why: fieldMessages.join(' ') || (err as Error).message };
    }
  };
  const refused = (errors: FieldErrors<T>) => errorMessages(errors).join(' ');
  const follow = () => form.reset(JSON.parse(savedValues) as T);
  const { saveNow, failure } = useAutosave({ form, formKey, keyOf, savedKey: keyOf(saved), send, refused, follow });

  useEffect(() => {
    drafts.set(formKey, form.getValues());
    return form.subscribe({ formState: { values: true }, callback: ({ values }) => drafts.set(formKey, values) });
  }, [form, drafts, formKey]);

  useStoreVersion(dirty);
  const pending = dirty.get(formKey);
  const status: SaveStatus = pending === 'failed' ? 'failed' : pending ? 'saving' : saysNothing(clean(saved)) ? 'empty' : 'saved';
  const onSubmit = (e?: { preventDefault: () => void }) => {
    e?.preventDefault();
    void saveNow();
  };
  // The summary lists every error of the panel, each once.
  const fieldErrors = errorMessages(form.formState.errors);
  const errors = status !== 'failed' ? [] : fieldErrors.length ? fieldErrors : [failure];
  const panel: PanelProps = { status, failure, errors, onSubmit };
  return { form, panel, saveNow };
}
