import nodemailer, { type Transporter } from 'nodemailer';
import type { WorkerConfig } from '../config';

export function smtpTransport(smtp: WorkerConfig['smtp']): Transporter {
  return nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: smtp.secure,
    ...(smtp.user ? { auth: { user: smtp.user, pass: smtp.password ?? '' } } : {}),
    // A dead provider must fail fast so the row goes back to the queue, not hang the tick.
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
}
