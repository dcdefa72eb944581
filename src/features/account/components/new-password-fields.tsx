import { PASSWORD_MIN } from '@shared/schemas/people';

/** A new password is typed twice, so a slip of the finger does not lock anyone out. */
export const REPEAT_DIFFERS = { path: ['repeat'], message: 'The two passwords differ' };

export const PASSWORD_HINT = `At least ${PASSWORD_MIN} characters; a few unrelated words work well.`;
