import { DEMO_DATA_NOTICE } from '@channelwright/shared/device';
import { Alert, Stack } from '@mantine/core';
import { IconFlask, IconInfoCircle } from '@tabler/icons-react';

/** What a profile is not: a foundry's model; and, for the seeded profiles, anything real at all. */
export function ProcessCautions({ demoData }: { demoData: boolean }) {
  return (
    <Stack gap="xs">
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
