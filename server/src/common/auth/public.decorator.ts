import { SetMetadata } from '@nestjs/common';

export const IS_PUBLIC_KEY = 'channelwright:isPublic';

/** Opts a route out of the global JWT guard: it answers without a signed-in user. */
export const Public = () => SetMetadata(IS_PUBLIC_KEY, true);
