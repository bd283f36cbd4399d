import type { FieldValues, Resolver } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';

/**
 * zodResolver over the values as they will be sent. A form keeps what a person types (a capacity as
 * text, an empty box for "no limit"); `toInput` turns that into the shared schema's input, so the
 * schema checks exactly what the server will, and `handleSubmit` receives the schema's output.
 */
export function resolverFor<V extends FieldValues, S extends z.ZodType>(schema: S, toInput: (values: V) => unknown): Resolver<V, unknown, z.output<S>> {
  const check = zodResolver(schema as never) as unknown as Resolver<V, unknown, z.output<S>>;
  return (values, context, options) => check(toInput(values) as V, context, options);
}

/** A number typed in a text box: empty is "none" (null); anything else the schema checks as a number (NaN fails it). */
export const numberOrNull = (text: string): number | null => (text.trim() === '' ? null : Number(text));
