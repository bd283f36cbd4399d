import { useLayoutEffect, useRef, type ComponentProps, type KeyboardEvent, type Ref } from 'react';
import { TextAreaField } from './text-area-field';

type Props = Omit<ComponentProps<typeof TextAreaField>, 'rows' | 'areaClassName'>;

/** Browsers that size a text area by its content (field-sizing) need no script. */
const sizesItself = () => typeof CSS !== 'undefined' && CSS.supports('field-sizing', 'content');

function fit(area: HTMLTextAreaElement | null) {
  if (!area || sizesItself()) return;
  area.style.height = 'auto';
  area.style.height = `${area.scrollHeight + 2}px`;
}

function assign<T>(ref: Ref<T> | undefined, value: T) {
  if (typeof ref === 'function') ref(value);
  else if (ref) ref.current = value;
}

/**
 * A one-line value that wraps instead of being cut off: one line tall while short, taller as the
 * text runs long. Enter does not start a new line (the value is one line; the form saves on Enter).
 */
export function GrowingTextField({ ref, onChange, onKeyDown, ...rest }: Props) {
  const own = useRef<HTMLTextAreaElement | null>(null);
  useLayoutEffect(() => fit(own.current));
  const noNewLine = (e: KeyboardEvent<HTMLTextAreaElement>) => {
    if (e.key === 'Enter') e.preventDefault();
    onKeyDown?.(e);
  };
  return (
    <TextAreaField
      {...rest}
      rows={1}
      data-one-line=""
      ref={(area: HTMLTextAreaElement | null) => {
        own.current = area;
        assign(ref, area);
        fit(area);
      }}
      onChange={(e) => {
        onChange?.(e);
        fit(e.currentTarget);
      }}
      onKeyDown={noNewLine}
      areaClassName="min-h-11 resize-none overflow-hidden [field-sizing:content]"
    />
  );
}
