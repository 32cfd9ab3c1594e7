// Preloaded (node --require) into a fake started by supervise.js: the IPC channel to the supervisor
// closes when the supervisor ends for any reason, and the fake then ends too instead of lingering.
'use strict';
if (process.channel) {
  process.on('disconnect', () => process.exit(0));
  // The channel alone must not keep the fake alive, nor count as work to wait for.
  process.channel.unref();
}
