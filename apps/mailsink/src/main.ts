import { HTTP_PORT_VARIABLE, readMailSinkConfig, SMTP_PORT_VARIABLE } from './config';
import { createMailSink, type MailSink } from './mail-sink';
import { isMailSinkError, type MailSinkError } from './sink-error';

function fail(line: string): never {
  process.stderr.write(`mail sink: ${line}\n`);
  process.exit(1);
}

// The library message says "choose another port"; from the command line the fix is a variable.
function startupLine(error: MailSinkError): string {
  if (error.code === 'PORT_IN_USE' && error.listener) {
    const { role, host, port } = error.listener;
    const variable = role === 'smtp' ? SMTP_PORT_VARIABLE : HTTP_PORT_VARIABLE;
    return `port ${port} on ${host} is already in use — stop the other process or set ${variable}`;
  }
  return error.message;
}

async function start(): Promise<void> {
  const read = readMailSinkConfig(process.env);
  if (!read.ok) fail(read.error.message);
  const { config } = read;

  let sink: MailSink;
  try {
    sink = await createMailSink({
      ...config,
      onMessage: (message) =>
        console.log(`mail sink: received ${message.id} to ${message.to.join(', ') || message.envelope.rcptTo.join(', ')} — ${JSON.stringify(message.subject)}`),
      onProblem: (description) => process.stderr.write(`mail sink: ${description}\n`),
    });
  } catch (error) {
    fail(isMailSinkError(error) ? startupLine(error) : `could not start (${String(error)})`);
  }

  // Listening for the stop signals before the line that says it is ready: whoever reads that line may stop it at once.
  let stopping = false;
  const stop = (signal: NodeJS.Signals) => {
    if (stopping) {
      fail(`${signal} again — stopping without waiting`);
    }
    stopping = true;
    sink.close().then(
      () => {
        console.log('mail sink: stopped');
        process.exit(0);
      },
      (error: unknown) => fail(`could not stop cleanly (${String(error)})`),
    );
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);

  console.log(
    `mail sink: SMTP on ${config.host}:${sink.smtpPort}, mail at http://${config.host}:${sink.httpPort}/ (${sink.messages().length} kept in ${config.dataDir})`,
  );
}

void start();
