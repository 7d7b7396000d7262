import { ExothermAnswer, ExothermRequest } from '../exotherm';
import { route } from './route';

export const exothermRoutes = {
  forecastExotherm: route({
    method: 'post',
    path: '/exotherm',
    tag: 'exotherm',
    summary: 'Forecast one layer’s exotherm (peak, when, how deep; with limitC the deepest layer under it), as `gelpoint exotherm --json` does',
    access: 'member',
    body: ExothermRequest,
    response: ExothermAnswer,
  }),
};
