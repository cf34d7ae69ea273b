import type { ReceivedMail } from '@channelwright/shared/schemas';
import { Paper, Stack } from '@mantine/core';
import { useState } from 'react';
import { ErrorPanel } from '../../../components/error-panel';
import { PageHeader } from '../../../components/page-header';
import { PageLoader } from '../../../components/page-loader';
import { useMyMail } from '../api/get-my-mail';
import { MailReader } from '../components/mail-reader';
import { ReceivedMailTable } from '../components/received-mail-table';

/** "My mail": the notices the local mail sink received for the signed-in user (empty when a real mail server is set up). */
export default function MyMailRoute() {
  const mail = useMyMail();
  const [open, setOpen] = useState<ReceivedMail | null>(null);
  return (
    <Stack gap="sm">
      <PageHeader title="My mail" description="The notices this server mailed to you, as its local mail sink received them." />
      {mail.isPending ? (
        <PageLoader label="Loading your mail" />
      ) : mail.isError ? (
        <ErrorPanel title="Your mail could not be loaded" message={mail.error.message} onRetry={() => void mail.refetch()} />
      ) : (
        <Paper withBorder radius="sm" p={0}>
          <ReceivedMailTable mails={mail.data} label="My mail" onOpen={setOpen} />
        </Paper>
      )}
      <MailReader mail={open} onClose={() => setOpen(null)} />
    </Stack>
  );
}
