/** Sending an answer's text (written by server/jobs/job.ts renderResult, here or in a worker thread). */
import type { FastifyReply } from 'fastify';
import type { KeptAnswer } from '../answerCache.js';

export function sendAnswer(reply: FastifyReply, a: KeptAnswer): FastifyReply {
  if (a.filename !== undefined) reply.header('content-disposition', `inline; filename="${a.filename}"`);
  return reply.type(a.mediaType).send(a.body);
}
