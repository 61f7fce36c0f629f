import { csrfSync } from 'csrf-sync';

export const { csrfSynchronisedProtection: csrfProtection, generateToken } = csrfSync({
  getTokenFromRequest: (req) => req.get('x-csrf-token'),
  errorConfig: { statusCode: 403, code: 'csrf-invalid', message: 'The form expired: reload the page and try again.' },
});
