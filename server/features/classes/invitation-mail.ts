import type { OutgoingMail } from '../../lib/mailer';

interface ClassInfo {
  className: string;
  courseTitle: string;
  courseSlug: string;
}

const longDate = (d: Date) =>
  d.toLocaleDateString('en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

export function invitationMail(
  appUrl: string,
  to: string,
  name: string | null,
  token: string,
  expiresAt: Date,
  c: ClassInfo,
): OutgoingMail {
  return {
    to,
    subject: `Your invitation to ${c.className} on Tickwright`,
    text: [
      `Hello${name ? ` ${name}` : ''},`,
      '',
      `The guild office has invited you to join the class ${c.className}, which works through the course "${c.courseTitle}".`,
      '',
      'To accept, open this link, choose your password and you are in:',
      `${appUrl}/invitation/${token}`,
      '',
      `The link works once and until ${longDate(expiresAt)}. If it has run out, ask the guild office for a new one.`,
      'If you were not expecting this invitation, you can ignore this message.',
    ].join('\n'),
  };
}

export function enrolledMail(appUrl: string, to: string, name: string, c: ClassInfo): OutgoingMail {
  return {
    to,
    subject: `You are enrolled in ${c.className}`,
    text: [
      `Hello ${name},`,
      '',
      `The guild office has enrolled you in the class ${c.className}, on the course "${c.courseTitle}".`,
      'Sign in with your usual account to start:',
      `${appUrl}/courses/${c.courseSlug}`,
    ].join('\n'),
  };
}
