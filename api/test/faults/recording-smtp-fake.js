#!/usr/bin/env node
// An SMTP server for the outbox fault tests: every message it accepts is appended to a JSON-lines file
// (envelope recipient, subject, Message-ID) before it answers 250, so what the relay was told "accepted"
// is on disk even if this process is killed the next instant, and the record survives a restart.
// RECORDING_SMTP_PORT, RECORDING_SMTP_FILE; RECORDING_SMTP_DELAY_MS slows each message (a busy relay), so a
// test can stop things mid-way through a fan-out. A recipient whose address starts with "refuse-" gets 550.
'use strict';
const { SMTPServer } = require('smtp-server');
const { appendFileSync } = require('node:fs');

const port = Number(process.env.RECORDING_SMTP_PORT);
const file = process.env.RECORDING_SMTP_FILE;
const delayMs = Number(process.env.RECORDING_SMTP_DELAY_MS || 0);
if (!port || !file) throw new Error('RECORDING_SMTP_PORT and RECORDING_SMTP_FILE are required');

function header(head, name) {
  const unfolded = head.replace(/\r?\n[ \t]+/g, ' ');
  const match = new RegExp(`^${name}:[ \\t]*(.*)$`, 'im').exec(unfolded);
  return match ? match[1].trim() : '';
}

const server = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS', 'AUTH'],
  logger: false,
  // A stop (SIGTERM) cuts open connections soon: the relay sees its unfinished messages fail and tries again later.
  closeTimeout: 200,
  onRcptTo(address, _session, callback) {
    if (address.address.startsWith('refuse-')) {
      const error = new Error('5.1.1 mailbox unavailable');
      error.responseCode = 550;
      return callback(error);
    }
    return callback();
  },
  onData(stream, session, callback) {
    const chunks = [];
    stream.on('data', (chunk) => chunks.push(chunk));
    stream.on('end', async () => {
      if (delayMs) await new Promise((done) => setTimeout(done, delayMs));
      const raw = Buffer.concat(chunks).toString('utf8');
      const head = raw.split(/\r?\n\r?\n/, 1)[0];
      const record = {
        to: session.envelope.rcptTo.map((rcpt) => rcpt.address.toLowerCase()),
        subject: header(head, 'Subject'),
        messageId: header(head, 'Message-ID'),
        listUnsubscribe: header(head, 'List-Unsubscribe'),
        at: Date.now(),
      };
      appendFileSync(file, `${JSON.stringify(record)}\n`);
      callback(null, 'queued as recorded');
    });
  },
});
// A client that vanishes mid-message (a relay killed with SIGKILL) is that client's problem, not the server's.
server.on('error', (error) => console.log(`connection error: ${error.code ?? error.message}`));
server.listen(port, '127.0.0.1', () => console.log(`recording SMTP fake on 127.0.0.1:${port}, writing ${file}`));
process.on('SIGTERM', () => server.close(() => process.exit(0)));
