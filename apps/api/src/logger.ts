import { pino, type DestinationStream, type Logger, type LoggerOptions } from 'pino';

const CENSORED = '[redacted]';

// Headers that carry a credential: the bearer token, the session cookie (both ways), the CSRF
// marker and the shop thermometer's token.
const secretHeaders = ['authorization', 'cookie', 'x-gelpoint-csrf', 'x-gelpoint-ingest-token', 'proxy-authorization'];

// Values that may hold a link's token: the request URL as logged by pino-http, the path the error
// handler names, and the route parameters and query the request serializer copies.
const urlPaths = ['req.url', 'path', 'url'];

const redactedPaths = [
  ...secretHeaders.map((h) => `req.headers["${h}"]`),
  'res.headers["set-cookie"]',
  'req.params.token',
  'req.params.feed',
  'req.query.token',
  // A failed query keeps its parameters, which can be a token's hash or a password's.
  'err.parameters',
  'err.driverError.parameters',
  // Anything that names a secret outright, wherever a log call puts it.
  '*.password',
  '*.newPassword',
  '*.token',
  '*.ingestToken',
];

// An invitation's token is the path segment after /invitations/ (the API's route and the web
// app's link; routes match without regard to case), except under /shop/, where it is a row's id.
// A reset link carries its token in the query.
const invitationSegment = /(?<!\/shop)\/(invitations)\/[^/?#]+/gi;
// A member's calendar feed is a capability too: its token is the path segment after /calendar/.
const calendarSegment = /\/(calendar)\/(?!rotate\b)[^/?#]+/gi;
const tokenQuery = /([?&](?:token|ingest_token|ingestToken)=)[^&#]*/gi;

/** The URL with every link token in it replaced, so the route stays readable in the log. */
export function withoutTokens(url: string): string {
  return url.replace(invitationSegment, `/$1/${CENSORED}`).replace(calendarSegment, `/$1/${CENSORED}`).replace(tokenQuery, `$1${CENSORED}`);
}

function censor(value: unknown, path: string[]): unknown {
  const key = path.join('.');
  if (urlPaths.includes(key) && typeof value === 'string') return withoutTokens(value);
  return CENSORED;
}

export const loggerRedaction: LoggerOptions['redact'] = { paths: [...redactedPaths, ...urlPaths], censor };

/** The API's logger: JSON lines with secrets redacted, to stdout unless a destination is given. */
export function createLogger(level: string, destination?: DestinationStream): Logger {
  const options: LoggerOptions = { level, redact: loggerRedaction };
  return destination ? pino(options, destination) : pino(options);
}
