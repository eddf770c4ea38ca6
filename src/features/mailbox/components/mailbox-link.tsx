// A header link to the development mailbox, shown only while mail goes to the loopback fake.
import { Link } from 'react-router-dom';
import { useMailbox } from '../api/get-mailbox';

export function MailboxLink() {
  const mailbox = useMailbox();
  if (!mailbox.data) return null;
  return (
    <Link
      to="/dev/mailbox"
      className="rounded-md border border-dashed border-paper/60 px-2 py-1 text-xs font-semibold text-paper hover:bg-paper/10"
    >
      Dev mailbox
    </Link>
  );
}
