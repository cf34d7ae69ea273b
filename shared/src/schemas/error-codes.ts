/**
 * Every code an API error body can carry: the one list. `DomainError` (server) and `EngineError` (engine)
 * take only these, so the type system refuses a code nobody listed; the client maps each to a title,
 * exhaustively; the OpenAPI document lists them. A test checks that every code here is thrown somewhere.
 */
export const ERROR_CODES = [
  // Any route.
  'VALIDATION_FAILED',
  'UNAUTHENTICATED',
  'FORBIDDEN',
  'ROUTE_NOT_FOUND',
  'CONFLICT',
  'STALE_EDIT',
  'NO_CHANGES',
  'TOO_MANY_REQUESTS',
  'PAYLOAD_TOO_LARGE',
  'REQUEST_REFUSED',
  'INTERNAL_ERROR',
  'DATABASE_UNAVAILABLE',
  // Accounts and sign-in.
  'INVALID_CREDENTIALS',
  'ACCOUNT_DISABLED',
  'EMAIL_TAKEN',
  'SIGNUP_DISABLED',
  'USER_NOT_FOUND',
  'LAST_ADMIN',
  // Process profiles.
  'PROCESS_NOT_FOUND',
  'PROCESS_VERSION_NOT_FOUND',
  'PROCESS_NAME_TAKEN',
  'PROCESS_IN_USE',
  'NOT_PROCESS_MAINTAINER',
  'IMPORT_INVALID',
  'FILE_REQUIRED',
  // Projects and members.
  'PROJECT_NOT_FOUND',
  'MEMBER_NOT_FOUND',
  'MEMBER_EXISTS',
  'LAST_OWNER',
  // Sheets and devices.
  'SHEET_NOT_FOUND',
  'SHEET_HAS_REVISIONS',
  'DEVICE_NOT_FOUND',
  'DEVICE_NAME_TAKEN',
  'MATCH_GROUP_NOT_FOUND',
  'MATCH_GROUP_NOT_SIZED',
  'OFFSET_TARGET_REQUIRED',
  // Revisions.
  'REVISION_NOT_FOUND',
  'REVISION_SIGNED_OFF',
  'REVISION_IMMUTABLE',
  'REVISION_OTHER_SHEET',
  'SHEET_HAS_NO_DEVICES',
  'SHEET_RESULTS_STALE',
  // Reviews.
  'REVIEW_REQUEST_NOT_FOUND',
  'SELF_REVIEW',
  'REVIEWER_NOT_ELIGIBLE',
  'NOT_ASSIGNED_REVIEWER',
  'NOT_REQUEST_AUTHOR',
  'REVIEW_ALREADY_OPEN',
  'REVIEW_ALREADY_DECIDED',
  'REVIEW_WITHDRAWN',
  'REVISION_SUPERSEDED',
  'REVISION_CHANGES_REQUESTED',
  'REVISION_HASH_MISMATCH',
  'DEVICE_NOT_IN_REVISION',
  'COMMENT_NOT_ALLOWED',
  // The device engine (EngineError).
  'PROCESS_REQUIRED',
  'PROCESS_INVALID',
  'UNKNOWN_CORNER',
  'UNKNOWN_FLAVOUR',
  'FLAVOUR_POLARITY_MISMATCH',
  'L_BELOW_LMIN',
  'W_BELOW_WMIN',
  'W_TOO_LARGE',
  'FINGER_WIDTH_BELOW_WMIN',
  'VSB_BEYOND_FORWARD_LIMIT',
  'TEMPERATURE_BELOW_ABSOLUTE_ZERO',
  'GM_ID_ABOVE_WEAK_INVERSION_LIMIT',
  'GM_ID_NOT_REACHABLE',
  'GM_ID_TOO_LOW',
  'ID_NOT_REACHABLE_BELOW_VDD',
  'SOLVER_DID_NOT_CONVERGE',
  'ZTC_NOT_FOUND',
  // The table model (lookup tables characterised from a model card).
  'TABLE_INVALID',
  'TABLE_CORRUPT',
  'CORNER_NOT_IN_TABLE',
  'TEMPERATURE_OUTSIDE_TABLE',
  'L_OUTSIDE_TABLE',
  'VDS_OUTSIDE_TABLE',
  'VSB_OUTSIDE_TABLE',
  'VGS_OUTSIDE_TABLE',
  'GM_ID_ABOVE_TABLE',
  'GM_ID_BELOW_TABLE',
  'ID_OUTSIDE_TABLE',
  // Model cards and characterisation.
  'MODEL_CARD_REFUSED',
  'MODEL_CARD_INVALID',
  'MODEL_NOT_IN_CARD',
  'MODEL_POLARITY_MISMATCH',
  'CORNER_WITHOUT_SECTION',
  'SECTION_NOT_IN_CARD',
  'LEVEL_NOT_CHARACTERISED',
  'SIMULATION_FAILED',
  'CHARACTERISATION_CANCELLED',
] as const;

export type ErrorCode = (typeof ERROR_CODES)[number];

const known = new Set<string>(ERROR_CODES);

export function isErrorCode(value: unknown): value is ErrorCode {
  return typeof value === 'string' && known.has(value);
}
