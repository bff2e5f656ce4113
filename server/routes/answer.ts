/** Sending a computation's result in the chosen form. */
import type { FastifyReply } from 'fastify';
import { toJson } from '../../core/formatHydrostatics.js';
import type { AnyComputation } from '../computations/computation.js';
import { CSV_MEDIA_TYPE, JSON_MEDIA_TYPE } from '../negotiate.js';
import type { Format } from '../requestFields.js';

export function sendResult(reply: FastifyReply, c: AnyComputation, result: unknown, format: Format, filename: string): FastifyReply {
  if (format === 'csv' && c.csv !== undefined) {
    return reply
      .type(CSV_MEDIA_TYPE)
      .header('content-disposition', `inline; filename="${filename}.csv"`)
      .send(c.csv(result));
  }
  return reply.type(JSON_MEDIA_TYPE).send(toJson(result));
}
