import { useQuery } from '@tanstack/react-query';
import { QueryErrorNotice } from '../../../app/query-error-notice';
import { Banner } from '../../../components/ui/banner';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Loading } from '../../../components/ui/loading';
import { PageHeader } from '../../../components/ui/page-header';
import { mailboxQuery } from '../api/mailbox-query';
import { MailMessage } from './mail-message';

export function MailboxScreen() {
  const mailbox = useQuery(mailboxQuery());
  const messages = [...(mailbox.data?.messages ?? [])].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));

  return (
    <>
      <PageHeader
        eyebrow="Administration"
        title="Mailbox"
        description="Messages Sojourn sent while running with the local mail catcher. Follow the links to accept invitations or reset passwords in a demo."
        actions={
          <Button onClick={() => mailbox.refetch()} busy={mailbox.isFetching && !mailbox.isPending}>
            Check for new mail
          </Button>
        }
      />
      {mailbox.isPending && <Loading label="Loading messages…" />}
      {mailbox.isError && <QueryErrorNotice error={mailbox.error} what="mailbox" onRetry={() => mailbox.refetch()} />}
      {mailbox.isSuccess && !mailbox.data.enabled && (
        <Banner tone="info" title="No mail catcher here">
          This installation sends e-mail through a real mail server, so there is nothing to show.
        </Banner>
      )}
      {mailbox.isSuccess && mailbox.data.enabled && messages.length === 0 && (
        <EmptyState title="No messages caught yet">Invite a person or request a password reset; the e-mail appears here within seconds.</EmptyState>
      )}
      {messages.length > 0 && (
        <div className="flex flex-col gap-4">
          <p className="text-sm text-ink-soft" role="status">
            {messages.length} {messages.length === 1 ? 'message' : 'messages'}, newest first.
          </p>
          {messages.map((m) => (
            <MailMessage key={m.id} mail={m} />
          ))}
        </div>
      )}
    </>
  );
}
