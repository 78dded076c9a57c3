import type { APIRoute } from 'astro';
import { visibleMail } from '../../server/dev-mail';
import { errorResponse } from '../../server/http';

export const prerender = false;

export const GET: APIRoute = ({ clientAddress, locals }) => {
  const mail = visibleMail(clientAddress, locals);
  return mail ? Response.json(mail) : errorResponse('not_found');
};
