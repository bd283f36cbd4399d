import { Controller, useWatch, type Control, type FieldValues, type Path, type UseFormRegister, type FieldErrors } from 'react-hook-form';
import type { QuantityKind } from '@shared/calc';
import { MADE_BY_KINDS } from '@shared/schemas/build-sections';
import { MADE_BY_LABELS } from '@shared/build-sheet/choice-labels';
import type { FigureInput as Figure } from '@shared/schemas/figure';
import { FigureInput } from '@client/components/ui/figure-input';
import { CheckNote } from '@client/components/ui/check-note';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { GrowingTextField } from '@client/components/ui/growing-text-field';
import { useFieldWarning, useNumbers } from '../numbers/numbers-context';
import { asNumber } from './form-values';
import { useEditor, type FormKey } from './editor-stores';

/**
 * A row of a list (a credit, an extra line): on wide screens label, value and Remove side by side.
 * The columns may shrink below their boxes' natural width (minmax(0, …)), so Remove stays inside
 * the panel however narrow the middle column is.
 */
export const LIST_ROW = 'grid min-w-0 gap-2 border-b border-rule pb-3 sm:grid-cols-[minmax(0,2fr)_minmax(0,3fr)_auto] sm:items-start';

/** A dotted path's error message in react-hook-form's nested errors. */
export function errorAt(errors: FieldErrors, path: string): string | undefined {
  let at: unknown = errors;
  for (const key of path.split('.')) at = (at as Record<string, unknown> | undefined)?.[key];
  return (at as { message?: string } | undefined)?.message;
}

type FigureFieldProps<T extends FieldValues> = { control: Control<T>; name: Path<T>; label: string; kind: QuantityKind; form: FormKey; hint?: string; defaultUnit?: string };

/** A figure box bound to the form, with the spec check's warning for it beside it. */
export function FigureField<T extends FieldValues>({ control, name, label, kind, form, hint, defaultUnit }: FigureFieldProps<T>) {
  const { system } = useNumbers();
  const warning = useFieldWarning(form, name);
  const { build } = useEditor();
  const evidencePhotos = build.photos.map((p, i) => ({ id: p.id, label: p.caption ? `Photo ${i + 1}: ${p.caption}` : `Photo ${i + 1}` }));
  return (
    <Controller
      control={control}
      name={name}
      render={({ field, fieldState }) => (
        <div className="flex min-w-0 flex-col gap-1">
          <FigureInput
            label={label}
            kind={kind}
            system={system}
            value={field.value as Figure | undefined}
            onChange={field.onChange}
            onBlur={field.onBlur}
            error={fieldState.error as never}
            {...(hint ? { hint } : {})}
            {...(defaultUnit ? { defaultUnit } : {})}
            evidencePhotos={evidencePhotos}
          />
          {/* The field's own error already says what is wrong; the spec check would only repeat it. */}
          {warning && !fieldState.error ? <CheckNote message={warning.message} why={warning.why} /> : null}
        </div>
      )}
    />
  );
}

type Registered<T extends FieldValues> = { register: UseFormRegister<T>; errors: FieldErrors<T>; name: Path<T>; label: string; hint?: string; form?: FormKey };

/** A plain number (ratios, counts, rpm): empty is "not said". */
export function NumberField<T extends FieldValues>({ register, errors, name, label, hint, form }: Registered<T>) {
  const warning = useFieldWarning(form ?? 'engine', form ? name : '\u0000');
  return (
    <div className="flex flex-col gap-1">
      <TextField label={label} inputMode="decimal" autoComplete="off" className="tabular-nums" {...register(name, asNumber as never)} error={errorAt(errors, name)} {...(hint ? { hint } : {})} />
      {warning && !errorAt(errors, name) ? <Warning message={warning.message} why={warning.why} /> : null}
    </div>
  );
}

/** The spec check's note for one field (see CheckNote: the reasoning is one tap away). */
export const Warning = CheckNote;

export function TextInput<T extends FieldValues>({ register, errors, name, label, hint, form }: Registered<T>) {
  const warning = useFieldWarning(form ?? 'engine', form ? name : '\u0000');
  return (
    <div className="flex flex-col gap-1">
      {/* Wraps instead of cutting off a long answer (a paint description, a tyre in the owner's words). */}
      <GrowingTextField label={label} autoComplete="off" {...register(name)} error={errorAt(errors, name)} {...(hint ? { hint } : {})} />
      {/* The field's own error already says what is wrong; the spec check would only repeat it. */}
      {warning && !errorAt(errors, name) ? <Warning message={warning.message} why={warning.why} /> : null}
    </div>
  );
}

export function Choice<T extends FieldValues>({ register, errors, name, label, options, labels, placeholder = 'Not said' }: Registered<T> & { options: readonly string[]; labels?: Record<string, string>; placeholder?: string }) {
  return <SelectField label={label} options={options.map((value) => ({ value, label: labels?.[value] ?? value }))} placeholder={placeholder} {...register(name)} error={errorAt(errors, name)} />;
}

/** "Made by" and "why this choice", on every spec section. */
export function MadeByFields<T extends FieldValues>({ register, errors, control }: { register: UseFormRegister<T>; errors: FieldErrors<T>; control: Control<T> }) {
  const kind = useWatch({ control, name: 'madeBy.kind' as Path<T> }) as string | undefined;
  return (
    <div className="grid gap-4 border-t border-rule pt-3 sm:grid-cols-2">
      <SelectField label="Made by" options={MADE_BY_KINDS.map((k) => ({ value: k, label: MADE_BY_LABELS[k] }))} placeholder="Not said" {...register('madeBy.kind' as Path<T>)} error={errorAt(errors, 'madeBy.kind')} />
      {kind === 'shop' || kind === 'donor' ? (
        <GrowingTextField label={kind === 'shop' ? 'Shop or person' : 'Donor vehicle'} autoComplete="off" {...register('madeBy.name' as Path<T>)} error={errorAt(errors, 'madeBy.name')} />
      ) : (
        <div className="hidden sm:block" />
      )}
      <TextAreaField label="Why this choice" rows={3} className="sm:col-span-2" {...register('note' as Path<T>)} error={errorAt(errors, 'note')} />
    </div>
  );
}
