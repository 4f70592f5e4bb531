// Every route of the web app. Routes are thin: a loader that guards and prefetches with the
// feature's query options, and a page that composes feature components. The calculators and the
// case page load lazily because they bring mathjs (and the case page XState and the fault-tree
// package), the heaviest dependencies, which the other screens never need.
import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter, type RouteObject } from 'react-router';
import type { AreaId } from './areas';
import { CasesRoute, casesLoader, casesShouldRevalidate } from './routes/cases';
import { ComingLaterArea, comingLaterLoader } from './routes/coming-later-area';
import { FindingsRoute, findingsLoader, findingsShouldRevalidate } from './routes/findings';
import { ForgotPasswordRoute } from './routes/forgot-password';
import { OutboxRoute, outboxLoader } from './routes/outbox';
import { RepairOrderRoute, repairOrderLoader } from './routes/repair-order';
import { SetPasswordRoute } from './routes/set-password';
import { HomeRoute } from './routes/home';
import { NewCaseRoute, newCaseLoader } from './routes/new-case';
import { SignInRoute, signInLoader } from './routes/sign-in';
import { SignedInLayout, signedInLoader } from './routes/signed-in-layout';
import { StaffRoute, staffLoader } from './routes/staff';
import { UnlockRoute } from './routes/unlock';
import { AppErrorPage, NotFoundPage, RouteErrorPage, StartingUp } from './shell/error-pages';

// One module for every calculator route, so they share one lazily loaded chunk.
const calculatorsModule = () => import('./routes/calculators');
const caseModule = () => import('./routes/case');
// The logs screen has its own chunk: it brings recharts, which no other screen needs.
const caseLogsModule = () => import('./routes/case-logs');
// The tree screens share two lazy chunks: the library and versions, and the editor with the graph.
const treesModule = () => import('./routes/trees');
const treeDraftModule = () => import('./routes/tree-draft');
// The lead's training screens and the learner's casebook: one lazy chunk each.
const trainingModule = () => import('./routes/training');
const casebookModule = () => import('./routes/casebook');

// Areas whose capability is not built yet get an honest placeholder; none at the moment.
const comingLaterAreas: readonly AreaId[] = [];

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    {
      id: 'root',
      errorElement: <AppErrorPage />,
      hydrateFallbackElement: <StartingUp />,
      children: [
        { path: '/sign-in', loader: signInLoader(queryClient), Component: SignInRoute },
        // Opened from e-mailed links, without a session.
        { path: '/forgot-password', Component: ForgotPasswordRoute },
        { path: '/set-password', Component: SetPasswordRoute },
        { path: '/unlock', Component: UnlockRoute },
        {
          id: 'signed-in',
          loader: signedInLoader(queryClient),
          Component: SignedInLayout,
          children: [
            {
              // Pathless: errors below render inside the frame, so the navigation stays usable.
              errorElement: <RouteErrorPage />,
              children: [
                { index: true, Component: HomeRoute },
                { path: 'staff', loader: staffLoader(queryClient), Component: StaffRoute },
                {
                  path: 'cases',
                  loader: casesLoader(queryClient),
                  shouldRevalidate: casesShouldRevalidate,
                  Component: CasesRoute,
                },
                { path: 'cases/new', loader: newCaseLoader(queryClient), Component: NewCaseRoute },
                {
                  path: 'cases/:caseId',
                  lazy: async () => {
                    const route = await caseModule();
                    return { loader: route.caseLoader(queryClient), Component: route.CaseRoute };
                  },
                },
                {
                  path: 'findings',
                  loader: findingsLoader(queryClient),
                  shouldRevalidate: findingsShouldRevalidate,
                  Component: FindingsRoute,
                },
                {
                  path: 'cases/:caseId/logs',
                  lazy: async () => {
                    const route = await caseLogsModule();
                    return {
                      loader: route.caseLogsLoader(queryClient),
                      Component: route.CaseLogsRoute,
                    };
                  },
                },
                {
                  path: 'cases/:caseId/repair-order',
                  loader: repairOrderLoader(queryClient),
                  Component: RepairOrderRoute,
                },
                { path: 'outbox', loader: outboxLoader(queryClient), Component: OutboxRoute },
                {
                  path: 'trees',
                  lazy: async () => {
                    const route = await treesModule();
                    return { loader: route.treesLoader(queryClient), Component: route.TreesRoute };
                  },
                },
                {
                  path: 'trees/:treeId',
                  lazy: async () => {
                    const route = await treesModule();
                    return { loader: route.treeLoader(queryClient), Component: route.TreeRoute };
                  },
                },
                {
                  path: 'trees/:treeId/compare',
                  lazy: async () => {
                    const route = await treesModule();
                    return {
                      loader: route.compareLoader(queryClient),
                      Component: route.CompareRoute,
                    };
                  },
                },
                {
                  path: 'trees/:treeId/draft',
                  lazy: async () => {
                    const route = await treeDraftModule();
                    return { loader: route.draftLoader(queryClient), Component: route.DraftRoute };
                  },
                },
                {
                  path: 'trees/:treeId/draft/publish',
                  lazy: async () => {
                    const route = await treeDraftModule();
                    return {
                      loader: route.publishLoader(queryClient),
                      Component: route.PublishRoute,
                    };
                  },
                },
                {
                  path: 'training',
                  lazy: async () => {
                    const route = await trainingModule();
                    return {
                      loader: route.trainingLayoutLoader(queryClient),
                      Component: route.TrainingLayout,
                    };
                  },
                  children: [
                    {
                      index: true,
                      lazy: async () => {
                        const route = await trainingModule();
                        return {
                          loader: route.trainingCasesLoader(queryClient),
                          Component: route.TrainingCasesRoute,
                        };
                      },
                    },
                    {
                      path: 'courses',
                      lazy: async () => {
                        const route = await trainingModule();
                        return {
                          loader: route.coursesLoader(queryClient),
                          Component: route.CoursesRoute,
                        };
                      },
                    },
                    {
                      path: 'progress',
                      lazy: async () => {
                        const route = await trainingModule();
                        return {
                          loader: route.progressLoader(queryClient),
                          Component: route.ProgressRoute,
                        };
                      },
                    },
                  ],
                },
                {
                  path: 'casebook',
                  lazy: async () => {
                    const route = await casebookModule();
                    return {
                      loader: route.casebookLoader(queryClient),
                      Component: route.CasebookRoute,
                    };
                  },
                },
                {
                  path: 'casebook/progress',
                  lazy: async () => {
                    const route = await casebookModule();
                    return {
                      loader: route.myProgressLoader(queryClient),
                      Component: route.MyProgressRoute,
                    };
                  },
                },
                {
                  path: 'casebook/attempts/:attemptId',
                  lazy: async () => {
                    const route = await casebookModule();
                    return {
                      loader: route.attemptLoader(queryClient),
                      Component: route.AttemptRoute,
                    };
                  },
                },
                {
                  path: 'casebook/:trainingCaseId',
                  lazy: async () => {
                    const route = await casebookModule();
                    return {
                      loader: route.casebookCaseLoader(queryClient),
                      Component: route.CasebookCaseRoute,
                    };
                  },
                },
                {
                  path: 'casebook/:trainingCaseId/replay',
                  lazy: async () => {
                    const route = await casebookModule();
                    return {
                      loader: route.replayLoader(queryClient),
                      Component: route.ReplayRoute,
                    };
                  },
                },
                ...comingLaterAreas.map((areaId) => ({
                  path: areaId,
                  loader: comingLaterLoader(queryClient, areaId),
                  element: <ComingLaterArea areaId={areaId} />,
                })),
                {
                  path: 'calculators',
                  lazy: async () => {
                    const route = await calculatorsModule();
                    return {
                      loader: route.calculatorsLoader(queryClient),
                      Component: route.CalculatorsLayout,
                    };
                  },
                  children: [
                    {
                      index: true,
                      lazy: async () => ({
                        Component: (await calculatorsModule()).CalculatorsIndexRoute,
                      }),
                    },
                    {
                      path: ':calculatorId',
                      lazy: async () => {
                        const route = await calculatorsModule();
                        return { loader: route.calculatorLoader, Component: route.CalculatorRoute };
                      },
                    },
                  ],
                },
                { path: '*', Component: NotFoundPage },
              ],
            },
          ],
        },
      ],
    },
  ];
}

export function createAppRouter(queryClient: QueryClient) {
  return createBrowserRouter(createRoutes(queryClient));
}
