// The yardstick for the HTTP load benchmark: the same validated calculation behind a bare node:http server.
import { createServer } from 'node:http';
import { calculate, SizingInputError } from '@/lib/engine';

const port = Number(process.argv[2] ?? 3299);
createServer((req, res) => {
  const chunks: Buffer[] = [];
  req.on('data', (c: Buffer) => chunks.push(c));
  req.on('end', () => {
    try {
      const result = calculate(JSON.parse(Buffer.concat(chunks).toString('utf8')));
      res.writeHead(200, { 'content-type': 'application/json' }).end(JSON.stringify(result));
    } catch (err) {
      const errors = err instanceof SizingInputError ? err.issues : [{ path: '', message: 'bad request' }];
      res.writeHead(400, { 'content-type': 'application/json' }).end(JSON.stringify({ errors }));
    }
  });
}).listen(port, '127.0.0.1', () => console.log(`bare calculate server on ${port}`));
