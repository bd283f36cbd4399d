import { useEffect, useRef, useState } from 'react';
import { useForm, type DefaultValues, type FieldValues } from 'react-hook-form';
import type { UseMutationResult } from '@tanstack/react-query';
import type { z } from 'zod';
import type { OwnerBuild } from '@shared/schemas/build';
import { formResolver, placeServerErrors, cleanValues, stableStringify } from './form-values';
import { useEditor, useStoreVersion, type FormKey } from './editor-stores';

/** Every message in a nested error object, for the summary at the top of a form. */
function errorMessages(error: unknown): string[] {
  if (!error || typeof error !== 'object') return [];
  const own = typeof (error as { message?: unknown }).message === 'string' ? [(error as { message: string }).message] : [];
  const nested = Object.entries(error).filter(([k]) => k !== 'ref' && k !== 'message' && k !== 'type').flatMap(([, v]) => errorMessages(v));
  return [...new Set([...own, ...nested])];
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
 * One section of the editor: its own form on the shared schema, saved on its own. It tells the
 * editor when it holds unsaved changes and feeds its live values to the numbers panel.
 */
export function useEditorForm<T extends FieldValues, S>({ formKey, schema, fromBuild, clean = cleanValues as (values: T) => unknown, mutation, fields }: Options<T, S>) {
  const { build, drafts, dirty } = useEditor();
  const saved = fromBuild(build);
  const savedKey = JSON.stringify(saved);
  const form = useForm<T>({ resolver: formResolver<T>(schema, clean), defaultValues: saved as DefaultValues<T>, mode: 'onTouched' });
  const [formError, setFormError] = useState('');
  // "Unsaved" means: what Save would send differs from what is saved. (react-hook-form's own isDirty
  // also counts boxes that were never filled in, so it is not used.)
  const savedClean = stableStringify(clean(saved));
  const lastSaved = useRef(savedClean);
  useStoreVersion(dirty);
  const isDirty = dirty.get(formKey) === true;

  // When the build changes elsewhere (a dyno run applied, a weigh-in used), follow it unless the owner is mid-edit.
  useEffect(() => {
    if (lastSaved.current === savedClean) return;
    const wasEdited = stableStringify(clean(form.getValues())) !== lastSaved.current;
    lastSaved.current = savedClean;
    if (!wasEdited) form.reset(JSON.parse(savedKey) as T);
  }, [form, clean, savedClean, savedKey]);

  useEffect(() => {
    const check = (values: unknown) => {
      drafts.set(formKey, values);
      dirty.set(formKey, stableStringify(clean(values as T)) !== savedClean ? true : undefined);
    };
    check(form.getValues());
    return form.subscribe({ formState: { values: true }, callback: ({ values }) => check(values) });
  }, [form, drafts, dirty, formKey, clean, savedClean]);
  useEffect(() => () => dirty.set(formKey, undefined), [dirty, formKey]);

  const onSubmit = form.handleSubmit(
    (data) => {
      setFormError('');
      mutation.mutate(data as unknown as S, {
        onSuccess: ({ build: next }) => form.reset(fromBuild(next)),
        onError: (err) => setFormError(placeServerErrors(err, form.setError, fields) || ''),
      });
    },
    (errors) => setFormError(`Not saved yet: ${errorMessages(errors).slice(0, 3).join(' ')}`),
  );

  const status: 'saving' | 'unsaved' | 'saved' | 'empty' = mutation.isPending ? 'saving' : isDirty ? 'unsaved' : saysNothing(clean(saved)) ? 'empty' : 'saved';

  return { form, onSubmit, formError, status, saving: mutation.isPending };
}
