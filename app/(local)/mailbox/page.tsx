import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { requirePermission } from "@/lib/server/auth";
import { formatInZone } from "@/lib/domain/time-zones";
import { listOrganizationMail } from "@/lib/server/data/mailbox";
import { getOrganization } from "@/lib/server/data/organizations";
import { isMailboxEnabled } from "@/lib/server/services/mailbox";

export const metadata: Metadata = { title: "Local mailbox", robots: { index: false } };
export const dynamic = "force-dynamic";

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

/** Plain text with its links made clickable. */
function Linked({ text }: { text: string }) {
  return (
    <>
      {text.split(URL_PATTERN).map((part, i) =>
        i % 2 === 1 ? (
          <a key={i} href={part}>
            {part}
          </a>
        ) : (
          <span key={i}>{part}</span>
        ),
      )}
    </>
  );
}

// Exists only while the local SMTP catcher runs (MAILBOX_URL set): a stand-in for the inboxes of the
// people an organization writes to, shown to that organization's admins only.
export default async function MailboxPage() {
  if (!isMailboxEnabled()) notFound();
  const viewer = await requirePermission("mailbox:view");
  const [messages, organization] = await Promise.all([listOrganizationMail({ viewer }), getOrganization({ viewer })]);
  return (
    <main className="mx-auto max-w-3xl space-y-4 px-4 py-8">
      <div>
        <h1>Local mailbox</h1>
        <p className="text-sm text-ink-soft">
          Every e-mail your organization sent while running with the local fakes. Nothing here left this machine.
        </p>
      </div>
      {messages.length === 0 ? <p className="text-ink-faint">No mail caught yet.</p> : null}
      {messages.map((m) => (
        <article key={m.id} className="panel" data-testid="caught-message">
          <header className="mb-2 border-b border-paper-edge pb-2 text-sm">
            <p className="font-semibold">{m.subject}</p>
            <p className="text-ink-soft">
              To <span className="measure">{m.to.join(", ")}</span> · from {m.from} ·{" "}
              <time dateTime={m.receivedAt}>{formatInZone(m.receivedAt, organization.timeZone, "datetime")}</time>
            </p>
          </header>
          <div className="whitespace-pre-wrap text-sm">
            <Linked text={m.text} />
          </div>
          {m.attachments?.length ? (
            <ul className="mt-2 border-t border-paper-edge pt-2 text-sm text-ink-soft" aria-label="Attachments">
              {m.attachments.map((a, i) => (
                <li key={i}>
                  Attached: <span className="measure">{a.fileName}</span> ({a.contentType}, {Math.max(1, Math.round(a.sizeBytes / 1024))}{" "}
                  KB)
                </li>
              ))}
            </ul>
          ) : null}
        </article>
      ))}
    </main>
  );
}
