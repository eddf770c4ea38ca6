// /dev/mailbox: the mails the loopback fake SMTP server caught, newest first, with working links. Only
// there while the fake is in use; a deployment with a real mail relay has no such page.
import { Card } from '../../../components/ui/card';
import { EmptyState } from '../../../components/ui/empty-state';
import { LoadError } from '../../../components/load-error';
import { PageHeader } from '../../../components/ui/page-header';
import { PageSpinner } from '../../../components/ui/spinner';
import { formatDateTime } from '../../../lib/format';
import { useMailbox } from '../api/get-mailbox';
import { MailText } from '../components/mail-text';

export function MailboxRoute() {
  const mailbox = useMailbox(3000);
  if (mailbox.isPending) return <PageSpinner label="Opening the mailbox…" />;
  if (mailbox.isError)
    return <LoadError what="the mailbox" error={mailbox.error} onRetry={() => void mailbox.refetch()} />;
  if (!mailbox.data) {
    return (
      <EmptyState title="No development mailbox">
        This server sends mail through a real mail relay, so there is nothing to show here.
      </EmptyState>
    );
  }
  const { mails, capacity } = mailbox.data;
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Development mailbox"
        description={`Mail this Lanewright sent, caught on this computer and never delivered. The newest ${capacity} are kept while the server runs; the page refreshes itself.`}
      />
      {mails.length === 0 && (
        <EmptyState title="No mail yet">
          Invite someone, sign up or ask for a password link, and the mail appears here.
        </EmptyState>
      )}
      <ol className="flex flex-col gap-4" aria-label="Caught mail">
        {mails.map((mail) => (
          <li key={mail.id}>
            <Card aria-label={mail.subject} className="flex flex-col gap-3">
              <div className="flex flex-col gap-1 border-b border-paper-sunk pb-3">
                <h2 className="text-lg font-semibold text-ink">{mail.subject}</h2>
                <p className="text-sm text-ink-soft">
                  To <span className="font-medium text-ink">{mail.to.join(', ')}</span> from {mail.from},{' '}
                  {formatDateTime(mail.receivedAt)}
                </p>
              </div>
              <MailText text={mail.text} />
            </Card>
          </li>
        ))}
      </ol>
    </div>
  );
}
