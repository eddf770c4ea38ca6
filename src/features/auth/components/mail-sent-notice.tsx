// What a page shows once a link is on its way by e-mail: the server's own wording, which is the same
// whether or not the address has an account.
import type { ReactNode } from 'react';

export function MailSentNotice({ message, children }: { message: string; children?: ReactNode }) {
  return (
    <div role="status" className="flex flex-col gap-3">
      <p className="font-semibold text-ink">{message}</p>
      <p className="text-sm text-ink-soft">
        Nothing there after a few minutes? Look in the spam folder, or check the address you typed and try again.
      </p>
      {children}
    </div>
  );
}
