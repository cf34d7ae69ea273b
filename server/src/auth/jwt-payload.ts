/** What an access token carries: the user's id. Everything else is read fresh from the database. */
export interface JwtPayload {
  sub: string;
  iat?: number;
  exp?: number;
  /** Set on tokens that are not access tokens (e-mail confirmation links); an access token has none. */
  purpose?: string;
}
