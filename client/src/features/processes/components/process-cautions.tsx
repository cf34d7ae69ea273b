import { DEMO_DATA_NOTICE } from '@channelwright/shared/device';
import { PARAMETER_CONVENTION } from '@channelwright/shared/schemas';
import { Alert, Stack } from '@mantine/core';
import { IconAlertTriangle, IconFlask, IconInfoCircle } from '@tabler/icons-react';

/**
 * What a profile is not: a foundry's model; and, for the seeded profiles, anything real at all. A version
 * written under an older parameter convention says what changed and what to check.
 */
export function ProcessCautions({ demoData, parameterConvention = PARAMETER_CONVENTION }: { demoData: boolean; parameterConvention?: number }) {
  return (
    <Stack gap="xs">
      {parameterConvention < PARAMETER_CONVENTION && (
        <Alert color="yellow" variant="light" icon={<IconAlertTriangle size={18} />} title="Written before engine 2.0: check kp">
          This version was saved when the all-region model used kp without the bulk-charge factor 1/n. Engine 2.0 reads kp as µ0·Cox in both models
          (SPICE&apos;s KP), so the all-region model now gives about n times less strong-inversion current with the same kp. If this kp was fitted to
          the old all-region model, multiply it by n (or fit it again) and save a new version; a kp taken from a SPICE card or from µ·Cox is right as
          it stands.
        </Alert>
      )}
      {demoData && (
        <Alert color="oxide" variant="light" icon={<IconFlask size={18} />} title={DEMO_DATA_NOTICE}>
          Brackenfold Semiconductor and this process are invented for the demo. Do not design real silicon with these numbers.
        </Alert>
      )}
      <Alert color="gray" variant="light" icon={<IconInfoCircle size={18} />}>
        A process profile is a first-order summary for hand sizing, not a foundry&apos;s process or device model. Check the numbers against your
        foundry&apos;s documentation.
      </Alert>
    </Stack>
  );
}
