#!/usr/bin/env node
// Local SMTP stand-in with an inbox web UI and REST API (GET /email lists messages).
// maildev starts its inbox web server on start and stops both servers itself on SIGTERM/SIGINT.
'use strict';
const startMailDev = require('maildev');
const { mkdirSync } = require('node:fs');

const smtp = Number(process.env.MAIL_FAKE_SMTP_PORT || 1025);
const web = Number(process.env.MAIL_FAKE_WEB_PORT || 1080);
const mailDirectory = process.env.MAIL_FAKE_DIR || '.data/mail';

mkdirSync(mailDirectory, { recursive: true });
const mailServer = startMailDev({ smtp, web, ip: '127.0.0.1', mailDirectory, silent: true });
mailServer.listen().then(
  () => console.log(`mail fake: SMTP on 127.0.0.1:${smtp}, inbox on http://127.0.0.1:${web}`),
  (error) => {
    console.error(`mail fake failed to start: ${error.message}`);
    process.exit(1);
  },
);
