import type { CaughtMail } from '@/lib/mail/mail-catcher';

export function CaughtMailList({ messages }: { messages: CaughtMail[] }) {
  if (messages.length === 0) return <p className="text-bark-soft">The catcher has no messages yet.</p>;
  return (
    <ul className="space-y-3" data-testid="caught-mail">
      {messages.map((m) => (
        <li key={m.id} className="rounded-lg border-2 border-shaving p-3">
          <details>
            <summary className="cursor-pointer">
              <span className="font-semibold">{m.subject}</span>{' '}
              <span className="text-sm text-bark-soft">
                to {m.to.join(', ')} · {new Date(m.receivedAt).toLocaleString('en-GB')}
              </span>
            </summary>
            <pre className="mt-2 font-sans text-sm whitespace-pre-wrap">{m.text}</pre>
            {m.attachments.length > 0 && (
              <p className="mt-2 text-sm">
                Attached:{' '}
                {m.attachments.map((a) => `${a.filename} (${Math.round(a.size / 1024)} KB)`).join(', ')}
              </p>
            )}
          </details>
        </li>
      ))}
    </ul>
  );
}
