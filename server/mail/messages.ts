// The wording of every mail Lanewright sends. Plain text only: the links are the point, and plain text
// reads the same in every mail program.
import { INVITATION_LIFETIME_DAYS } from '../../shared/api/invitations';
import { PASSWORD_RESET_MINUTES, SIGN_UP_LINK_HOURS } from '../../shared/api/account';
import type { OutgoingMail } from './mailer';

const signature =
  '\n\n-- \nLanewright, line planning for carrier-track assembly\nYou receive this because someone entered your address in Lanewright.';

export function invitationMail(
  to: string,
  args: { organisationName: string; inviterName: string; role: string; link: string },
): OutgoingMail {
  return {
    to,
    subject: `Join ${args.organisationName} on Lanewright`,
    text:
      `${args.inviterName} invites you to work in "${args.organisationName}" on Lanewright as ${args.role === 'engineer' ? 'an' : 'a'} ${args.role}.\n\n` +
      `Open this link to accept (valid ${INVITATION_LIFETIME_DAYS} days, once):\n${args.link}\n\n` +
      `Nothing changes until you accept. If you did not expect this, ignore this mail.${signature}`,
  };
}

export function passwordResetMail(to: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Choose a new Lanewright password',
    text:
      `Someone asked to reset the password of the Lanewright account for ${to}.\n\n` +
      `Open this link to choose a new password (valid ${PASSWORD_RESET_MINUTES} minutes, once):\n${link}\n\n` +
      `Choosing a new password signs you out everywhere. If you did not ask for this, ignore this mail; your password stays as it is.${signature}`,
  };
}

export function signUpMail(to: string, link: string): OutgoingMail {
  return {
    to,
    subject: 'Finish creating your Lanewright account',
    text:
      `Open this link to finish creating your Lanewright account (valid ${SIGN_UP_LINK_HOURS} hours, once):\n${link}\n\n` +
      `If you did not sign up, ignore this mail and no account is made.${signature}`,
  };
}

export function alreadyRegisteredMail(to: string, signInLink: string, resetLink: string): OutgoingMail {
  return {
    to,
    subject: 'You already have a Lanewright account',
    text:
      `Someone tried to create a Lanewright account for ${to}, which already has one, so nothing was changed.\n\n` +
      `Sign in here:\n${signInLink}\n\nForgot the password? Ask for a new one here:\n${resetLink}${signature}`,
  };
}

export function studyFinishedMail(
  to: string,
  args: {
    studyName: string;
    outcome: string;
    jobsDone: number;
    jobCount: number;
    failedJobs: number;
    took: string;
    link: string;
  },
): OutgoingMail {
  const failed =
    args.failedJobs > 0 ? ` ${args.failedJobs} job(s) failed on every attempt; the study page says why.` : '';
  return {
    to,
    subject: `Study finished: ${args.studyName}`,
    text:
      `Your study "${args.studyName}" has finished on the server after ${args.took}: ${args.outcome}.\n` +
      `${args.jobsDone} of ${args.jobCount} jobs have a result.${failed}\n\n` +
      `See the results:\n${args.link}\n\n` +
      `Results plan throughput only; guarding, risk assessment and electrical work follow the local codes, the machine's safety standards and licensed practice.${signature}`,
  };
}
