export type MailSinkErrorCode = 'PORT_IN_USE' | 'LISTEN_FAILED' | 'DATA_DIR_UNUSABLE' | 'INVALID_CONFIG';

export type ListenerRole = 'smtp' | 'http';

export interface ListenerAddress {
  role: ListenerRole;
  host: string;
  port: number;
}

/**
 * Start-up failures of the sink. It extends Error only so a rejected promise carries a stack for
 * debugging; callers branch on `code` and show `message`, which already says how to fix it.
 */
export class MailSinkError extends Error {
  override readonly name = 'MailSinkError';

  constructor(
    readonly code: MailSinkErrorCode,
    message: string,
    readonly listener?: ListenerAddress,
  ) {
    super(message);
  }
}

export function isMailSinkError(value: unknown): value is MailSinkError {
  return value instanceof MailSinkError;
}
