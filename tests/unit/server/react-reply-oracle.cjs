// Decodes server-action argument lists with React's own reply decoder, the one Next runs them through. Run with
// `node --conditions=react-server`; reads a JSON array of bodies on stdin, prints one verdict per body.
const { decodeReply, createTemporaryReferenceSet } = require('next/dist/compiled/react-server-dom-webpack/server.node');

let input = '';
process.stdin.on('data', (d) => (input += d));
process.stdin.on('end', async () => {
  const verdicts = [];
  for (const body of JSON.parse(input)) {
    try {
      const args = await decodeReply(body, {}, { temporaryReferences: createTemporaryReferenceSet() });
      verdicts.push(Array.isArray(args) ? 'ok' : 'not a list');
    } catch (error) {
      verdicts.push(`error: ${error.message}`);
    }
  }
  process.stdout.write(JSON.stringify(verdicts));
});
