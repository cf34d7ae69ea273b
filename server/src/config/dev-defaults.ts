/**
 * The JWT signing key used when JWT_SECRET is unset outside production. It is published in the
 * README, so a server started with NODE_ENV=production refuses it.
 */
export const DEV_JWT_SECRET = 'channelwright-development-secret-not-for-production';
