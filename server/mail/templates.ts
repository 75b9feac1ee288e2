// The messages Seedwake sends, each as plain text and as simple HTML with inline styles
// (mail programs ignore style sheets) in Seedwake's soil colours (tailwind.config.ts). Every
// value put into the HTML is escaped.
import type { Role } from '../../shared/api/auth';

export type MailContent = { subject: string; text: string; html: string };

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

const roleMeaning: Record<Role, string> = {
  owner: 'an owner: you can manage members and do everything an editor does',
  editor: 'an editor: you can build fields, profiles and strategies and run projections',
  viewer: 'a viewer: you can read what the workspace shares, and change nothing',
};

/** "14 March 2026, 09:30 UTC": mail is read anywhere, so the time zone is named. */
export const mailDate = (d: Date) =>
  `${new Intl.DateTimeFormat('en-GB', { dateStyle: 'long', timeStyle: 'short', timeZone: 'UTC' }).format(d)} UTC`;

type Block = { paragraphs: string[]; action?: { label: string; url: string }; footer: string[] };

function render(title: string, block: Block): { text: string; html: string } {
  const text = [
    ...block.paragraphs,
    ...(block.action ? [`${block.action.label}: ${block.action.url}`] : []),
    '',
    ...block.footer,
    '',
    '— Seedwake',
  ].join('\n\n');
  const p = (s: string) => `<p style="margin:0 0 16px;line-height:1.5">${escapeHtml(s)}</p>`;
  const action = block.action
    ? `<p style="margin:24px 0"><a href="${escapeHtml(block.action.url)}" style="display:inline-block;background:#241a13;color:#fbf8f2;padding:12px 20px;border-radius:6px;text-decoration:none;font-weight:600">${escapeHtml(block.action.label)}</a></p>` +
      `<p style="margin:0 0 16px;font-size:13px;color:#5b4636">Or paste this address into your browser: ${escapeHtml(block.action.url)}</p>`
    : '';
  const html = `<!doctype html><html><body style="margin:0;background:#fbf8f2;font-family:'IBM Plex Sans',Arial,sans-serif;color:#241a13">
<div style="max-width:560px;margin:0 auto;padding:32px 24px">
<div style="height:6px;border-radius:3px;background:linear-gradient(90deg,#241a13,#8a705a,#c08a3e)"></div>
<h1 style="font-family:Georgia,serif;font-size:24px;margin:24px 0 16px">${escapeHtml(title)}</h1>
${block.paragraphs.map(p).join('\n')}
${action}
<div style="border-top:1px solid #dccfb9;margin-top:24px;padding-top:16px;font-size:13px;color:#5b4636">${block.footer.map(p).join('\n')}</div>
<p style="font-size:13px;color:#5b4636">— Seedwake</p>
</div></body></html>`;
  return { text, html };
}

export function invitationMail(input: {
  inviter: string;
  workspace: string;
  role: Role;
  link: string;
  expiresAt: Date;
}): MailContent {
  const subject = `${input.inviter} invited you to ${input.workspace} on Seedwake`;
  return {
    subject,
    ...render(`Join ${input.workspace}`, {
      paragraphs: [
        `${input.inviter} invited you to the workspace “${input.workspace}” on Seedwake, where projections of weed seedbanks under management strategies are kept and compared.`,
        `You would join as ${roleMeaning[input.role]}.`,
      ],
      action: { label: 'Accept the invitation', url: input.link },
      footer: [
        `The link works once, until ${mailDate(input.expiresAt)}. If you do not have a Seedwake account yet, the page lets you create one.`,
        'If you did not expect this, ignore this message; nothing happens unless the link is used.',
      ],
    }),
  };
}

export function passwordResetMail(input: { name: string; link: string; minutes: number }): MailContent {
  return {
    subject: 'Reset your Seedwake password',
    ...render('Choose a new password', {
      paragraphs: [
        `Hello ${input.name}, someone (we hope you) asked to reset the password of your Seedwake account.`,
        'Choosing a new password signs you out everywhere you are signed in.',
      ],
      action: { label: 'Choose a new password', url: input.link },
      footer: [
        `The link works once, for ${input.minutes} minutes.`,
        'If you did not ask for this, ignore this message: your password stays as it is.',
      ],
    }),
  };
}

export function projectionsMail(input: {
  name: string;
  title: string;
  lines: string[];
  link: string;
  settingsLink: string;
}): MailContent {
  return {
    subject: input.title,
    ...render(input.title, {
      paragraphs: [`Hello ${input.name},`, ...input.lines],
      action: { label: 'Open the projections', url: input.link },
      footer: [
        `You get these e-mails for long projections you launch. Turn them off on your account page: ${input.settingsLink}`,
      ],
    }),
  };
}
