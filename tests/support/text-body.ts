import type request from 'supertest';

/** supertest keeps an image/* body as bytes: a parser that reads it as UTF-8 text into response.body. */
export function asText(response: request.Response, done: (error: Error | null, body: string) => void): void {
  const stream = response as unknown as NodeJS.ReadableStream;
  let text = '';
  stream.setEncoding('utf8');
  stream.on('data', (chunk: string) => (text += chunk));
  stream.on('end', () => done(null, text));
}
