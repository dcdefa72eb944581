import type { Control, FieldErrors, UseFormRegister, UseFormSetValue } from 'react-hook-form';
import type { PrintCreate, PrintCreateInput } from '@shared/schemas/print';

/** What each registrar section needs of the print form. */
export interface RegistrarFormParts {
  control: Control<PrintCreateInput, unknown, PrintCreate>;
  register: UseFormRegister<PrintCreateInput>;
  setValue: UseFormSetValue<PrintCreateInput>;
  errors: FieldErrors<PrintCreateInput>;
}

export const DATE_HINT = '2026-05-14, 2026-05, 2026, c. 1890, 1880–1890 or 1920s';
export const sectionClass =
  'grid min-w-0 gap-3 rounded border border-paper-edge p-3 md:grid-cols-3';
export const legendClass = 'px-1 font-serif text-xl';
