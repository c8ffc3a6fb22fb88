/**
 * Answers remembered by route and request body: a configurator sends the same member again on every
 * click that leaves it unchanged, and an answer depends on nothing but its body and the catalogues
 * loaded at start, so the same text may be sent again without the work. Least recently used answers
 * go first once the texts held pass the byte budget; a budget of 0 turns the cache off. Only
 * successful answers are kept.
 */

import type { FastifyReply, FastifyRequest } from 'fastify';
import { finiteJson, sendJsonText } from './answer-json.js';

/** The default budget: some 900 typical answers of 18 kB. */
export const DEFAULT_ANSWER_CACHE_BYTES = 32 * 1024 * 1024;

/** A text's size in memory: two bytes a UTF-16 code unit. */
function bytesOf(text: string): number {
  return 2 * text.length;
}

export class AnswerCache {
  private readonly answers = new Map<string, string>();
  private held = 0;
  private hitCount = 0;
  private missCount = 0;

  /** `budgetBytes`: what the keys and texts held may take together. */
  constructor(readonly budgetBytes: number) {}

  get enabled(): boolean {
    return this.budgetBytes > 0;
  }

  /** The remembered answer, now the most recently used; undefined when there is none. */
  get(key: string): string | undefined {
    const text = this.answers.get(key);
    if (text === undefined) {
      this.missCount++;
      return undefined;
    }
    this.hitCount++;
    this.answers.delete(key);
    this.answers.set(key, text);
    return text;
  }

  /** Remembers an answer unless it alone would take more than an eighth of the budget. */
  set(key: string, text: string): void {
    const size = bytesOf(key) + bytesOf(text);
    if (size > this.budgetBytes / 8 || this.answers.has(key)) return;
    this.answers.set(key, text);
    this.held += size;
    for (const [oldest, oldText] of this.answers) {
      if (this.held <= this.budgetBytes) break;
      this.answers.delete(oldest);
      this.held -= bytesOf(oldest) + bytesOf(oldText);
    }
  }

  get stats(): { entries: number; bytes: number; hits: number; misses: number } {
    return { entries: this.answers.size, bytes: this.held, hits: this.hitCount, misses: this.missCount };
  }
}

/** The key of an answer: the route's url and the body's text. */
export function answerKey(url: string, bodyText: string): string {
  return `${url}\n${bodyText}`;
}

/**
 * Answers a calculation route: the remembered text when the same body was answered before (looked up
 * when the body arrived, see json-body.ts), else the computed answer, serialised once (finite guard
 * included), remembered and sent.
 */
export function answerOnce(cache: AnswerCache, request: FastifyRequest, reply: FastifyReply, compute: () => unknown): void {
  if (request.knownAnswer !== '') {
    if (request.observed) request.observed.cacheHit = true;
    sendJsonText(reply, request.knownAnswer);
    return;
  }
  const text = finiteJson(compute());
  if (cache.enabled && request.bodyText !== '') cache.set(answerKey(request.url, request.bodyText), text);
  sendJsonText(reply, text);
}
