// An emptied box means "not given"; the schemas tell which fields want null (cleared) and which undefined (absent).

const blank = (v: unknown) => v === '' || v === null || v === undefined;

/** A number box: empty → undefined, so a required number reports "required" rather than NaN. */
export const numberOrUndefined = (v: unknown) => (blank(v) ? undefined : Number(v));

/** A number box of an optional field: empty → null. */
export const numberOrNull = (v: unknown) => (blank(v) ? null : Number(v));

/** A text box of an optional field: empty → null. */
export const textOrNull = (v: unknown) => (v === '' ? null : v);

/** A text box whose field is left out when empty. */
export const textOrUndefined = (v: unknown) => (v === '' ? undefined : v);

// datetime-local has no zone; the browser's own zone is the lab floor's, so it is read as local time.
/** A datetime-local box: empty → null, else the instant as ISO. */
export const localInstantOrNull = (v: unknown) => (typeof v === 'string' && v ? new Date(v).toISOString() : null);

/** A text box whose field is left out when only blanks were typed; what was typed is sent trimmed. */
export const trimmedOrUndefined = (v: unknown) => (typeof v === 'string' ? v.trim() || undefined : v);
