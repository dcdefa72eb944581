// Node's flags for the server process, used by `npm start` and by every bench server, so
// the figures are of the server as it runs.
//
// A larger young generation: a tone re-evaluation of 100,000 prints makes millions of
// short-lived objects (readings, trend points), and with the default 16 MB semi-space many
// of them were copied into the old generation before they died. 32 MB took the garbage
// collector's share of a re-evaluation from about 17 % down, and the run from 9.9 to 9.0 s
// (measured with the tone bench's database; see issue 14's note).
export const SERVER_NODE_FLAGS = ['--max-semi-space-size=32'];
