import { z } from 'zod';

// What text Placard accepts, decided once for every field that is stored or printed.
// Refused: C0 control characters other than tab (U+0009) and line feed (U+000A), DEL and the C1
// controls (Unicode general category Cc), because PostgreSQL cannot store U+0000 in text or JSONB
// and the others only hide or garble text; and unpaired UTF-16 surrogates (half of an emoji, which
// no UTF-8 database can store). A carriage return is part of a line break, so CRLF and CR become LF.
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const CONTROL = /[\u0000-\u0008\u000B-\u001F\u007F-\u009F]/;
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const normalizeLineBreaks = (text: string) => text.replace(/\r\n?/g, '\n');

/** True when the text holds nothing the rule above refuses. */
export const isAcceptableText = (text: string) => !CONTROL.test(text) && !LONE_SURROGATE.test(text);

export const unacceptableTextMessage = (label: string) =>
  `${label} contains a character we cannot keep (a control character or half of an emoji). Remove it and try again.`;

/** Any text a person types (no length limit of its own): line breaks made LF, then the rule above. */
export const text = (label: string) =>
  z
    .string({ error: (issue) => (issue.input === undefined ? `${label} is required.` : `${label} must be text.`) })
    .overwrite(normalizeLineBreaks)
    .refine(isAcceptableText, { error: unacceptableTextMessage(label) });

/** A trimmed text field with a length limit, e.g. `shortText('Paint', 300)`. */
export const shortText = (label: string, max = 200) =>
  text(label)
    .trim()
    .max(max, { error: `${label} must be at most ${max} characters.` });

/** A trimmed text field that may hold several lines and must not be empty, e.g. a payment note. */
export const requiredText = (label: string, max = 200) => shortText(label, max).min(1, { error: `${label} is required.` });

/** A trimmed text field that may hold several lines and may be empty, e.g. a description. */
export const optionalText = (label: string, max = 200) => shortText(label, max);

/**
 * One line of text (a name, a title, a search): a line break or tab pasted into it becomes one
 * space, since a name printed on a card or a certificate has no second line.
 */
export const lineText = (label: string, max = 200) =>
  text(label)
    .overwrite((v) => v.replace(/[\t\n]+/g, ' '))
    .trim()
    .max(max, { error: `${label} must be at most ${max} characters.` });

/** One line of text that must not be empty, e.g. `requiredLine('Venue', 200)`. */
export const requiredLine = (label: string, max = 200) => lineText(label, max).min(1, { error: `${label} is required.` });
