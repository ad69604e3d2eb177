import { createServer, Server } from 'node:http';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { SetupError } from './step-log';

/** One message caught by the local SMTP catcher. */
export interface CaughtMail {
  id: number;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  receivedAt: string;
}

/** A loopback SMTP server that keeps every message in memory and shows them over a small HTTP API. */
export interface MailCatcher {
  smtpPort: number;
  /** GET {apiUrl}/messages lists the caught messages (newest last); DELETE clears them. */
  apiUrl: string;
  messages(): CaughtMail[];
  /** Stops the SMTP side only (the API keeps answering), to try what happens while mail is down. */
  stopSmtp(): Promise<void>;
  /** Starts the SMTP side again on the same port. */
  startSmtp(): Promise<void>;
  stop(): Promise<void>;
}

function listenSmtp(server: SMTPServer, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    server.once('error', (error: NodeJS.ErrnoException) =>
      reject(new SetupError(`The SMTP catcher could not listen on 127.0.0.1:${port} (${error.code ?? error.message}).`, 'stop what uses the port or set SMTP_CATCHER_PORT to a free one.')),
    );
    server.listen(port, '127.0.0.1', () => resolve((server.server.address() as { port: number }).port));
  });
}

function createSmtp(store: CaughtMail[]): SMTPServer {
  return new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          store.push({
            id: store.length + 1,
            from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
            to: session.envelope.rcptTo.map((rcpt) => rcpt.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : '',
            receivedAt: new Date().toISOString(),
          });
          callback();
        })
        .catch((error: Error) => callback(error));
    },
  });
}

function createApi(store: CaughtMail[]): Server {
  return createServer((req, res) => {
    if (req.url === '/messages' && req.method === 'DELETE') {
      store.length = 0;
      res.writeHead(204).end();
    } else if (req.url === '/messages' && req.method === 'GET') {
      res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify(store));
    } else {
      res.writeHead(404, { 'content-type': 'text/plain' }).end('Try GET /messages');
    }
  });
}

/** Starts the catcher on loopback; port 0 picks free ports. */
export async function startMailCatcher(options: { smtpPort: number; apiPort: number }): Promise<MailCatcher> {
  const store: CaughtMail[] = [];
  let smtp = createSmtp(store);
  const smtpPort = await listenSmtp(smtp, options.smtpPort);
  const api = createApi(store);
  const apiPort = await new Promise<number>((resolve, reject) => {
    api.once('error', reject);
    api.listen(options.apiPort, '127.0.0.1', () => resolve((api.address() as { port: number }).port));
  });
  let smtpRunning = true;
  const stopSmtp = async () => {
    if (!smtpRunning) return;
    smtpRunning = false;
    await new Promise<void>((resolve) => smtp.close(() => resolve()));
  };
  return {
    smtpPort,
    apiUrl: `http://127.0.0.1:${apiPort}`,
    messages: () => [...store],
    stopSmtp,
    async startSmtp() {
      if (smtpRunning) return;
      smtp = createSmtp(store);
      await listenSmtp(smtp, smtpPort);
      smtpRunning = true;
    },
    async stop() {
      await stopSmtp();
      await new Promise<void>((resolve) => {
        api.close(() => resolve());
        api.closeAllConnections();
      });
    },
  };
}
