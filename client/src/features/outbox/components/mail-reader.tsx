import type { ReceivedMail } from '@channelwright/shared/schemas';
import { Code, Modal, Stack, Tabs, Text } from '@mantine/core';
import { formatDateTime } from '../../../lib/format-date';

/** One received message: its headers, the plain-text part, and the HTML part in a sandboxed frame (no scripts, no links out). */
export function MailReader({ mail, onClose }: { mail: ReceivedMail | null; onClose: () => void }) {
  return (
    <Modal opened={mail !== null} onClose={onClose} title={mail?.subject ?? ''} size="lg">
      {mail && (
        <Stack gap="xs">
          <Text size="sm">
            <b>From</b> {mail.from} · <b>To</b> {mail.to.join(', ')} · {formatDateTime(mail.receivedAt)}
          </Text>
          <Tabs defaultValue="text">
            <Tabs.List>
              <Tabs.Tab value="text">Plain text</Tabs.Tab>
              <Tabs.Tab value="html">HTML</Tabs.Tab>
            </Tabs.List>
            <Tabs.Panel value="text" pt="xs">
              <Code block aria-label="Plain-text part" style={{ whiteSpace: 'pre-wrap', overflowWrap: 'anywhere' }}>
                {mail.text}
              </Code>
            </Tabs.Panel>
            <Tabs.Panel value="html" pt="xs">
              <iframe title="HTML part" sandbox="" srcDoc={mail.html} style={{ width: '100%', height: 320, border: '1px solid var(--mantine-color-default-border)' }} />
            </Tabs.Panel>
          </Tabs>
        </Stack>
      )}
    </Modal>
  );
}
