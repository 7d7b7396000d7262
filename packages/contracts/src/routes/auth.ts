import { z } from 'zod';
import { Accepted, LoginRequest, MeResponse, PasswordResetConfirm, PasswordResetRequest, RegisterRequest, SessionResponse, SwitchShopRequest } from '../auth';
import { route } from './route';

export const authRoutes = {
  register: route({
    method: 'post',
    path: '/auth/register',
    tag: 'auth',
    summary: 'Create a shop and its lead, and sign in',
    access: 'public',
    body: RegisterRequest,
    response: SessionResponse,
    status: 201,
  }),
  login: route({
    method: 'post',
    path: '/auth/login',
    tag: 'auth',
    summary: 'Sign in with e-mail and password',
    access: 'public',
    body: LoginRequest,
    response: SessionResponse,
  }),
  logout: route({ method: 'post', path: '/auth/logout', tag: 'auth', summary: 'Sign out: ends this session for good', access: 'member' }),
  logoutEverywhere: route({ method: 'post', path: '/auth/logout-everywhere', tag: 'auth', summary: 'Sign out of every device', access: 'member' }),
  me: route({
    method: 'get',
    path: '/me',
    tag: 'auth',
    summary: 'Who is signed in, in which shop, with which role, and their calendar feed',
    access: 'member',
    response: MeResponse,
  }),
  switchShop: route({
    method: 'post',
    path: '/auth/switch-shop',
    tag: 'auth',
    summary: 'Work in another of your shops (a new session replaces this one)',
    access: 'member',
    body: SwitchShopRequest,
    response: SessionResponse,
  }),
  requestPasswordReset: route({
    method: 'post',
    path: '/auth/password-reset',
    tag: 'auth',
    summary: 'E-mail a one-time link to choose a new password',
    access: 'public',
    body: PasswordResetRequest,
    response: Accepted,
    status: 202,
  }),
  confirmPasswordReset: route({
    method: 'post',
    path: '/auth/password-reset/confirm',
    tag: 'auth',
    summary: 'Set a new password with the e-mailed token; ends every session',
    access: 'public',
    body: PasswordResetConfirm,
    response: z.undefined(),
  }),
};
