import type { ReceivedMail } from '@channelwright/shared/schemas';
import { Paper, Stack, Tabs, TextInput } from '@mantine/core';
import { useDebouncedValue } from '@mantine/hooks';
import type { UseQueryResult } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useOutbox } from '../api/get-outbox';
import { useReceivedMail } from '../api/get-received-mail';
import { DeliveryTable } from '../components/delivery-table';
import { MailReader } from '../components/mail-reader';
import { ReceivedMailTable } from '../components/received-mail-table';

/** A list once loaded, in a frame; or its loader, or why it failed. */
function Loaded<T>({ query, what, children }: { query: UseQueryResult<T>; what: string; children: (data: T) => ReactNode }) {
  if (query.isPending) return <PageLoader label={`Loading ${what}`} />;
  if (query.isError) return <ErrorPanel title={`The ${what} could not be loaded`} message={query.error.message} />;
  return (
    <Paper withBorder radius="sm" p={0}>
      {children(query.data)}
    </Paper>
  );
}

/** The admins' mail page: what the local SMTP sink received, and how every delivery went. */
export default function AdminMailRoute() {
  const [to, setTo] = useState('');
  const [recipient] = useDebouncedValue(to, 300);
  const received = useReceivedMail(recipient);
  const outbox = useOutbox(recipient);
  const [open, setOpen] = useState<ReceivedMail | null>(null);

  return (
    <Stack gap="sm">
      <PageHeader
        title="Mail outbox"
        description="Without SMTP_URL the server delivers its mail to a local sink of its own; every message it received is here. The deliveries tab shows every message sent, with retries and errors."
      />
      <TextInput label="Recipient" placeholder="Any address, or part of one" value={to} onChange={(event) => setTo(event.currentTarget.value)} w={320} />
      <Tabs defaultValue="received">
        <Tabs.List>
          <Tabs.Tab value="received">Received by the local sink</Tabs.Tab>
          <Tabs.Tab value="deliveries">Deliveries</Tabs.Tab>
        </Tabs.List>
        <Tabs.Panel value="received" pt="sm">
          <Loaded query={received} what="mail">
            {(mails) => <ReceivedMailTable mails={mails} label="Received mail" onOpen={setOpen} />}
          </Loaded>
        </Tabs.Panel>
        <Tabs.Panel value="deliveries" pt="sm">
          <Loaded query={outbox} what="deliveries">
            {(messages) => <DeliveryTable messages={messages} />}
          </Loaded>
        </Tabs.Panel>
      </Tabs>
      <MailReader mail={open} onClose={() => setOpen(null)} />
    </Stack>
  );
}
