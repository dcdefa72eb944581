import { bootstrap } from '../bootstrap';
import { loadConfig } from '../config';
import { sendToneDigest } from '../services/tone/digest';

/** `npm run digest`: sends the weekly tone-watch digest now and waits for delivery. */
const ctx = await bootstrap(loadConfig(), { worker: false });
const result = await sendToneDigest(ctx);
console.log(
  `Digest sent to ${result.sent} conservator(s): ${result.alerts} new alerts, ${result.due} checks due.`,
);
await ctx.mailer.idle();
await ctx.mailer.close();
await ctx.closeDatabase();
