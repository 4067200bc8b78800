import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC = 'hopwise:isPublic';

/** Opts a route (or controller) out of the global sign-in guard. */
export const Public = () => SetMetadata(IS_PUBLIC, true);
