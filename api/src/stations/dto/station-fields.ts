import { applyDecorators } from '@nestjs/common';
import { Transform } from 'class-transformer';
import { IsNumber, Matches, Max, MaxLength, Min, MinLength, IsString } from 'class-validator';

/** Trimmed text; a blank optional text becomes null (clears the field). */
export const trimToNull = ({ value }: { value: unknown }) =>
  typeof value === 'string' ? (value.trim() === '' ? null : value.trim()) : value;
export const trim = ({ value }: { value: unknown }) =>
  typeof value === 'string' ? value.trim() : value;

export const NAME_MAX = 80;
export const NOTES_MAX = 2000;
/** Call signs: 3–12 of A–Z, 0–9 and `/` (portable and regional suffixes), stored upper-cased. */
export const CALL_SIGN_PATTERN = /^[A-Z0-9/]{3,12}$/;

const finite = { allowNaN: false, allowInfinity: false };

/** Decorators are applied bottom-up: the type check runs first and its reason is reported. */
export const NameField = () =>
  applyDecorators(
    Transform(trim),
    MaxLength(NAME_MAX),
    MinLength(1, { message: 'name must not be empty' }),
    IsString(),
  );

export const CallSignField = () =>
  applyDecorators(
    Transform(({ value }: { value: unknown }) => {
      const v = trimToNull({ value });
      return typeof v === 'string' ? v.toUpperCase() : v;
    }),
    Matches(CALL_SIGN_PATTERN, {
      message: 'callSign must be 3–12 characters of A–Z, 0–9 and /',
    }),
    IsString(),
  );

export const LatField = () =>
  applyDecorators(Max(90), Min(-90), IsNumber(finite, { message: 'latDeg must be a number' }));
export const LonField = () =>
  applyDecorators(Max(180), Min(-180), IsNumber(finite, { message: 'lonDeg must be a number' }));
export const ElevationField = () =>
  applyDecorators(
    Max(9000),
    Min(-500),
    IsNumber(finite, { message: 'elevationM must be a number (metres)' }),
  );
export const NotesField = () =>
  applyDecorators(Transform(trimToNull), MaxLength(NOTES_MAX), IsString());
