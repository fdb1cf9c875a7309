import { ROLE_LABELS, ROLE_SUMMARIES, type Role } from '../../../shared/domain/roles';
import type { OutgoingMail } from './mailer';

export function inviteMail(input: {
  to: string;
  link: string;
  role: Role;
  teamNumber: number;
  teamName: string;
  invitedByName: string;
}): OutgoingMail {
  const team = `Team ${input.teamNumber} ${input.teamName}`;
  return {
    to: input.to,
    subject: `${input.invitedByName} invited you to ${team} on Pitwall`,
    text: [
      `${input.invitedByName} invited you to join ${team} on Pitwall as ${ROLE_LABELS[input.role].toLowerCase()}.`,
      `${ROLE_LABELS[input.role]}s may: ${ROLE_SUMMARIES[input.role]}`,
      '',
      'Accept the invite and choose your password here (the link works for 7 days):',
      input.link,
      '',
      'If you did not expect this, ignore this mail.',
    ].join('\n'),
  };
}

export function passwordResetMail(input: { to: string; link: string; name: string }): OutgoingMail {
  return {
    to: input.to,
    subject: 'Reset your Pitwall password',
    text: [
      `Hello ${input.name},`,
      '',
      'Someone asked to reset the password of your Pitwall account. Choose a new one here (the link works for 1 hour):',
      input.link,
      '',
      'Setting a new password signs you out everywhere. If you did not ask for this, ignore this mail.',
    ].join('\n'),
  };
}
