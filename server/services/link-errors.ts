import { AppError } from '../errors';

/** Refusals for e-mailed links, each saying what to do next. */
export const linkErrors = {
  invalid: (what: 'invitation' | 'reset') =>
    new AppError(
      400,
      'link_invalid',
      what === 'invitation'
        ? 'This invitation link is not valid. Check that the whole link was copied, or ask the shop owner for a new invitation.'
        : 'This password link is not valid. Check that the whole link was copied, or ask for a new one.',
    ),
  expired: (what: 'invitation' | 'reset') =>
    new AppError(
      410,
      'link_expired',
      what === 'invitation'
        ? 'This invitation has expired (invitations last 7 days). Ask the shop owner to send a new one.'
        : 'This password link has expired (links last one hour). Ask for a new one.',
    ),
  used: (what: 'invitation' | 'reset') =>
    new AppError(
      410,
      'link_used',
      what === 'invitation'
        ? 'This invitation has already been used. Sign in with the e-mail and password chosen then, or ask the owner for a new invitation.'
        : 'This password link has already been used. Sign in with your new password, or ask for a new link.',
    ),
  revoked: () => new AppError(410, 'link_revoked', 'This invitation was withdrawn by the shop owner. Ask them for a new one if you still need access.'),
};
