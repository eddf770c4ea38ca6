// A caught mail's plain text with its addresses turned into links.
import { Fragment } from 'react';

const LINK = /(https?:\/\/[^\s<>"')]+)/g;

export function MailText({ text }: { text: string }) {
  return (
    <pre className="font-sans text-sm whitespace-pre-wrap break-words text-ink">
      {text.split(LINK).map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part} className="font-semibold text-accent-strong underline underline-offset-4 break-all">
            {part}
          </a>
        ) : (
          <Fragment key={i}>{part}</Fragment>
        ),
      )}
    </pre>
  );
}
