import { useMemo } from 'react';
import { isApiError } from '../../../lib/api-error';
import { symbolOf } from '../model/quantity-fields';
import { buildSizeRequest, FORM_FIELDS, type FieldErrors, type ProcessRef, type TargetDefaults } from '../model/size-request';
import type { TargetsValues } from '../model/targets';
import { useLiveSize } from './use-live-size';

/**
 * Everything the device page shows from its targets: the request they make, the live result, and
 * every refusal beside its field (the form's own reading first, then the server's answer).
 */
export function useDeviceSizing(values: TargetsValues, process: ProcessRef, defaults?: TargetDefaults) {
  const built = useMemo(() => buildSizeRequest(values, process, defaults), [values, process, defaults]);
  const live = useLiveSize(built.request);
  const serverField = isApiError(live.error) && live.error.field && FORM_FIELDS.has(live.error.field) ? live.error.field : undefined;
  const errors: FieldErrors = serverField && !(serverField in built.errors) ? { ...built.errors, [serverField]: live.error?.message } : built.errors;
  return {
    request: built.request,
    /** The request the shown result answers (the debounced one). */
    answeredRequest: live.request,
    result: live.data,
    error: built.request ? live.error : null,
    errorShownInForm: serverField !== undefined,
    errors,
    missing: built.missing.map((field) => symbolOf(field, values.polarity)),
    /** A field does not read (`-20u`, `abc`): what is shown answers the last valid entry. */
    invalid: Object.keys(built.errors).length > 0,
    updating: built.request !== null && !live.settled,
  };
}
