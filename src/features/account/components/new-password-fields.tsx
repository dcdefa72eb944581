import type { UseFormRegisterReturn } from 'react-hook-form';
import { PASSWORD_MIN } from '@shared/schemas/people';
import { TextField } from '@/components/ui/field';

/** A new password is typed twice, so a slip of the finger does not lock anyone out. */
export const REPEAT_DIFFERS = { path: ['repeat'], message: 'The two passwords differ' };

export const PASSWORD_HINT = `At least ${PASSWORD_MIN} characters; a few unrelated words work well.`;

/** The new password and its repetition, as every password form asks for them. */
export function NewPasswordFields({
  label,
  password,
  repeat,
  errors,
}: {
  label: 'Password' | 'New password';
  password: UseFormRegisterReturn;
  repeat: UseFormRegisterReturn;
  errors: { password?: string; repeat?: string };
}) {
  return (
    <>
      <TextField
        label={label}
        type="password"
        autoComplete="new-password"
        hint={PASSWORD_HINT}
        {...password}
        error={errors.password}
      />
      <TextField
        label={`${label} again`}
        type="password"
        autoComplete="new-password"
        {...repeat}
        error={errors.repeat}
      />
    </>
  );
}
