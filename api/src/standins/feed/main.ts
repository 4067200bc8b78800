/**
 * Runs the conditions-feed stand-in on its own (invented demo data):
 *   FEED_PORT=4100 node api/dist/standins/feed/main.js
 * then start the server with HOPWISE_FEED_URL=http://127.0.0.1:4100.
 */
import { FeedStandin } from './feed-standin.js';

const port = Number(process.env.FEED_PORT ?? 4100);
const standin = new FeedStandin();
const url = await standin.start(port);
console.log(`Conditions feed stand-in (invented demo data) on ${url}`);
