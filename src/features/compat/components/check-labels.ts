// The labels live in shared/ so the server's e-mails name the rows as the screens do.
export { checkLabel } from '@shared/compat/check-labels';
