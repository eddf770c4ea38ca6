// Read-only links to one thing for people without an account: make one with an expiry, copy it (it is
// shown once), see who made which link and when it was last opened, and withdraw it.
import { useState } from 'react';
import { SHARE_MAX_DAYS, type ShareKind } from '../../../../shared/api/shares';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Card, CardTitle } from '../../../components/ui/card';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { Table, Td, Th } from '../../../components/ui/table';
import { formatDateTime, formatPerson } from '../../../lib/format';
import { useCreateShare, useRevokeShare, useShares } from '../api/shares';

const EXPIRY_CHOICES = [1, 7, 14, 30, SHARE_MAX_DAYS];

export function SharePanel({ kind, subjectId, mayShare }: { kind: ShareKind; subjectId: string; mayShare: boolean }) {
  const shares = useShares(kind, subjectId);
  const create = useCreateShare(kind, subjectId);
  const revoke = useRevokeShare(kind, subjectId);
  const [days, setDays] = useState(14);
  const [copied, setCopied] = useState(false);
  const failure = create.error ?? revoke.error ?? shares.error;

  return (
    <Card aria-labelledby="share-title" className="flex flex-col gap-4">
      <CardTitle id="share-title">Share read-only</CardTitle>
      <p className="max-w-prose text-sm text-ink-soft">
        A link lets anyone who has it see this {kind}&apos;s results without an account, and change nothing. Withdraw it
        any time.
      </p>
      {failure && (
        <ErrorBanner title="Sharing did not work">
          <p>{failure.message}</p>
        </ErrorBanner>
      )}
      {mayShare && (
        <div className="flex flex-wrap items-end gap-3">
          <label className="flex flex-col gap-1 text-sm font-semibold">
            Link works for
            <select
              value={days}
              onChange={(event) => setDays(Number(event.target.value))}
              className="rounded-md border border-ink-faint bg-paper-raised px-3 py-2 font-normal"
            >
              {EXPIRY_CHOICES.map((choice) => (
                <option key={choice} value={choice}>
                  {choice} day{choice === 1 ? '' : 's'}
                </option>
              ))}
            </select>
          </label>
          <Button
            pending={create.isPending}
            pendingLabel="Making…"
            onClick={() => create.mutate(days, { onSuccess: () => setCopied(false) })}
          >
            Make a link
          </Button>
        </div>
      )}
      {create.data && (
        <div role="status" className="flex flex-col gap-2 rounded-md bg-accent-soft p-3">
          <p className="text-sm font-semibold text-ink">Copy this link now; it is not shown again.</p>
          <div className="flex flex-wrap items-center gap-2">
            <input
              readOnly
              aria-label="Share link"
              value={create.data.url}
              onFocus={(event) => event.target.select()}
              className="min-w-0 flex-1 rounded-md border border-ink-faint bg-paper-raised px-2 py-1 font-mono text-xs"
            />
            <Button
              variant="secondary"
              onClick={() => void navigator.clipboard?.writeText(create.data.url).then(() => setCopied(true))}
            >
              {copied ? 'Copied' : 'Copy'}
            </Button>
          </div>
        </div>
      )}
      {shares.data && shares.data.length > 0 && (
        <Table caption="Share links">
          <thead>
            <tr>
              <Th>Made by</Th>
              <Th>Made</Th>
              <Th>Works until</Th>
              <Th>Last opened</Th>
              <Th>State</Th>
              {mayShare && <Th className="text-right">Actions</Th>}
            </tr>
          </thead>
          <tbody>
            {shares.data.map((share) => (
              <tr key={share.id}>
                <Td>{formatPerson(share.createdBy)}</Td>
                <Td className="whitespace-nowrap">{formatDateTime(share.createdAt)}</Td>
                <Td className="whitespace-nowrap">{formatDateTime(share.expiresAt)}</Td>
                <Td className="whitespace-nowrap">
                  {share.lastOpenedAt ? formatDateTime(share.lastOpenedAt) : 'not yet'}
                </Td>
                <Td>
                  <Badge tone={share.state === 'active' ? 'accent' : 'neutral'}>
                    {share.state === 'revoked' ? 'withdrawn' : share.state}
                  </Badge>
                </Td>
                {mayShare && (
                  <Td className="text-right">
                    {share.state === 'active' && (
                      <Button
                        variant="quiet"
                        pending={revoke.isPending && revoke.variables === share.id}
                        onClick={() => revoke.mutate(share.id)}
                      >
                        Withdraw
                      </Button>
                    )}
                  </Td>
                )}
              </tr>
            ))}
          </tbody>
        </Table>
      )}
    </Card>
  );
}
