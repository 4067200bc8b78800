import { Transform, Type } from 'class-transformer';

/** Shared field decorators of the profile and sounding DTOs. */
export const trim = ({ value }: { value: unknown }) =>
  typeof value === 'string' ? value.trim() : value;

/** Query/form strings 'true'/'false' → booleans (anything else is left for @IsBoolean to refuse). */
export const toBoolean = () =>
  Transform(({ value }: { value: unknown }) =>
    value === 'true' ? true : value === 'false' ? false : value,
  );

/** Form and query fields arrive as strings: '' means absent, anything else becomes a number. */
export const toNumber = () =>
  Transform(({ value }: { value: unknown }) => {
    if (value === '' || value === undefined) return undefined;
    if (typeof value === 'string') return Number(value);
    return value;
  });

/** '1,2,3' → [1, 2, 3] (numbers; NaN left for validation to refuse). */
export const toNumberList = () =>
  Transform(({ value }: { value: unknown }) =>
    typeof value === 'string'
      ? value
          .split(',')
          .filter((s) => s.trim() !== '')
          .map((s) => Number(s))
      : value,
  );

export { Type };
