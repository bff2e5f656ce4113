/** Sending a computation's result in the chosen form. */
import type { FastifyReply } from 'fastify';
import type { KeptAnswer } from '../answerCache.js';
import type { AnyComputation } from '../computations/computation.js';
import { jsonText } from '../jsonText.js';
import { CSV_MEDIA_TYPE, JSON_MEDIA_TYPE } from '../negotiate.js';
import type { Format } from '../requestFields.js';

/** The result as the text of an answer, in the chosen form. */
export function renderResult(c: AnyComputation, result: unknown, format: Format, filename: string): KeptAnswer {
  if (format === 'csv' && c.csv !== undefined) return { mediaType: CSV_MEDIA_TYPE, body: c.csv(result), filename: `${filename}.csv` };
  return { mediaType: JSON_MEDIA_TYPE, body: jsonText(result) };
}

export function sendAnswer(reply: FastifyReply, a: KeptAnswer): FastifyReply {
  if (a.filename !== undefined) reply.header('content-disposition', `inline; filename="${a.filename}"`);
  return reply.type(a.mediaType).send(a.body);
}

export function sendResult(reply: FastifyReply, c: AnyComputation, result: unknown, format: Format, filename: string): FastifyReply {
  return sendAnswer(reply, renderResult(c, result, format, filename));
}
