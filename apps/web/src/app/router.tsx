import type { QueryClient } from '@tanstack/react-query';
import type { ComponentType } from 'react';
import { createBrowserRouter, redirect, type LoaderFunction, type RouteObject } from 'react-router';
import { landingPath, paths } from '../config/paths';
import { sessionQueryOptions } from '../features/auth/api/get-session';
import { RootErrorPage } from './routes/root-error';
import { RootHydrateFallback, RootLayout } from './routes/root';

export { paths };

/** What a lazily loaded route file offers: its page, and optionally a loader that needs the query client. */
interface RouteModule {
  Component: ComponentType;
  createLoader?: (queryClient: QueryClient) => LoaderFunction;
}

const toRoute =
  (queryClient: QueryClient) =>
  ({ Component, createLoader }: RouteModule) =>
    createLoader ? { Component, loader: createLoader(queryClient) } : { Component };

export function createAppRoutes(queryClient: QueryClient): RouteObject[] {
  const lazyRoute = (load: () => Promise<RouteModule>) => () => load().then(toRoute(queryClient));

  return [
    {
      id: 'root',
      path: paths.home.path,
      Component: RootLayout,
      HydrateFallback: RootHydrateFallback,
      ErrorBoundary: RootErrorPage,
      // Who is signed in is known before any page draws, and stays cached for the pages below.
      loader: async () => {
        await queryClient.ensureQueryData(sessionQueryOptions());
        return null;
      },
      children: [
        { index: true, loader: () => redirect(landingPath) },
        {
          lazy: lazyRoute(() => import('./routes/public/shell')),
          children: [
            { path: paths.signIn.path, lazy: lazyRoute(() => import('./routes/public/sign-in')) },
            { path: paths.createShop.path, lazy: lazyRoute(() => import('./routes/public/create-shop')) },
            { path: paths.forgotPassword.path, lazy: lazyRoute(() => import('./routes/public/forgot-password')) },
            { path: paths.resetPassword.path, lazy: lazyRoute(() => import('./routes/public/reset-password')) },
            { path: paths.acceptInvitation.path, lazy: lazyRoute(() => import('./routes/public/accept-invitation')) },
          ],
        },
        {
          id: 'frame',
          lazy: lazyRoute(() => import('./routes/app/frame')),
          children: [
            {
              // Errors of a page show inside the frame, so the menu stays usable.
              lazy: () => import('./routes/app/page-error').then(({ Component }) => ({ ErrorBoundary: Component })),
              children: [
                { path: paths.today.path, lazy: lazyRoute(() => import('./routes/app/today')) },
                { path: paths.pieces.path, lazy: lazyRoute(() => import('./routes/app/pieces/list')) },
                { path: paths.newPiece.path, lazy: lazyRoute(() => import('./routes/app/pieces/new')) },
                { path: paths.piece.path, lazy: lazyRoute(() => import('./routes/app/pieces/detail')) },
                { path: paths.moulds.path, lazy: lazyRoute(() => import('./routes/app/moulds/list')) },
                { path: paths.newMould.path, lazy: lazyRoute(() => import('./routes/app/moulds/new')) },
                { path: paths.mould.path, lazy: lazyRoute(() => import('./routes/app/moulds/detail')) },
                { path: paths.pourPlans.path, lazy: lazyRoute(() => import('./routes/app/pour-plans/list')) },
                { path: paths.newPourPlan.path, lazy: lazyRoute(() => import('./routes/app/pour-plans/new')) },
                { path: paths.pourPlan.path, lazy: lazyRoute(() => import('./routes/app/pour-plans/detail')) },
                { path: paths.editPourPlan.path, lazy: lazyRoute(() => import('./routes/app/pour-plans/edit')) },
                { path: paths.cureBoard.path, lazy: lazyRoute(() => import('./routes/app/cure-board')) },
                { path: paths.newPour.path, lazy: lazyRoute(() => import('./routes/app/pours/new')) },
                { path: paths.pour.path, lazy: lazyRoute(() => import('./routes/app/pours/detail')) },
                { path: paths.shelf.path, lazy: lazyRoute(() => import('./routes/app/shelf/overview')) },
                { path: paths.newResinSystem.path, lazy: lazyRoute(() => import('./routes/app/shelf/new-resin-system')) },
                { path: paths.resinSystem.path, lazy: lazyRoute(() => import('./routes/app/shelf/resin-system')) },
                { path: paths.newPigment.path, lazy: lazyRoute(() => import('./routes/app/shelf/new-pigment')) },
                { path: paths.pigment.path, lazy: lazyRoute(() => import('./routes/app/shelf/pigment')) },
                { path: paths.newLot.path, lazy: lazyRoute(() => import('./routes/app/shelf/new-lot')) },
                { path: paths.lot.path, lazy: lazyRoute(() => import('./routes/app/shelf/lot')) },
                { path: paths.team.path, lazy: lazyRoute(() => import('./routes/app/team')) },
                { path: paths.account.path, lazy: lazyRoute(() => import('./routes/app/account')) },
                { path: paths.shopSettings.path, lazy: lazyRoute(() => import('./routes/app/shop-settings')) },
                { path: paths.audit.path, lazy: lazyRoute(() => import('./routes/app/audit')) },
              ],
            },
          ],
        },
        // The run sheet and the cure record print on their own, without the frame's header and menu.
        { path: paths.runSheet.path, lazy: lazyRoute(() => import('./routes/app/pour-plans/run-sheet')) },
        { path: paths.pieceRecord.path, lazy: lazyRoute(() => import('./routes/app/pieces/record')) },
        { path: '*', lazy: lazyRoute(() => import('./routes/not-found')) },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createAppRoutes(queryClient));
}

export type AppRouter = ReturnType<typeof createAppRouter>;
