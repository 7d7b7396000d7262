import { Health } from '../health';
import { route } from './route';

export const healthRoutes = {
  health: route({
    method: 'get',
    path: '/health',
    tag: 'health',
    summary: 'Liveness and database reachability (503 when the database is down)',
    access: 'public',
    response: Health,
  }),
};
