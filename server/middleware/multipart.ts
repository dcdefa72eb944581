import { MulterError, type Options } from 'multer';
import { HttpProblem, problems } from './problem';

/** What one multipart route takes: one file of up to `fileSize` bytes and a few small fields. */
export interface MultipartShape {
  fileSize: number;
  /** Text fields besides the file. */
  fields: number;
  /** Longest text field, in bytes. */
  fieldSize: number;
}

/**
 * multer limits for a route that takes one file: every count and size bounded, so a
 * request of endless fields or parts is refused while it streams in, not held.
 */
export function multipartLimits(shape: MultipartShape): NonNullable<Options['limits']> {
  return {
    fileSize: shape.fileSize,
    files: 1,
    fields: shape.fields,
    fieldSize: shape.fieldSize,
    fieldNameSize: 100,
    parts: shape.fields + 1,
  };
}

const PLAIN: Partial<Record<MulterError['code'], string>> = {
  LIMIT_PART_COUNT: 'The form has more parts than this upload takes.',
  LIMIT_FIELD_COUNT: 'The form has more fields than this upload takes.',
  LIMIT_FILE_COUNT: 'Send one file at a time.',
  LIMIT_UNEXPECTED_FILE: 'Send the file as "file", one at a time.',
  LIMIT_FIELD_VALUE: 'This field is longer than this upload takes.',
  LIMIT_FIELD_KEY: 'A field name is too long.',
};

/** multer's errors as problem details in plain words: too large is 413, the rest 422. */
export function multipartProblem(error: unknown, tooLarge: string): unknown {
  if (!(error instanceof MulterError)) return error;
  if (error.code === 'LIMIT_FILE_SIZE') return new HttpProblem(413, 'Too large', tooLarge);
  const message = PLAIN[error.code] ?? 'The form could not be read.';
  return problems.invalid([{ path: error.field ?? 'file', message }]);
}
