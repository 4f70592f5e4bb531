// /training, /training/courses and /training/progress: the lead's side of the training casebook.
// Loaded lazily (see router.tsx). Each loader guards and prefetches what its section shows.
import type { QueryClient } from '@tanstack/react-query';
import { Outlet, type LoaderFunctionArgs } from 'react-router';
import { Panel, PageHeader } from '../../components/ui/page';
import { staffQueryOptions, useStaff } from '../../features/staff/api/get-staff';
import { candidatesQueryOptions } from '../../features/training/api/get-candidates';
import { coursesQueryOptions } from '../../features/training/api/get-courses';
import { progressQueryOptions } from '../../features/training/api/get-progress';
import { trainingCasesQueryOptions } from '../../features/training/api/get-training-cases';
import { CourseList } from '../../features/training/components/course-list';
import { MarkCaseForm } from '../../features/training/components/mark-case-form';
import { ProgressBoard } from '../../features/training/components/progress-board';
import { SectionTabs } from '../../features/training/components/section-tabs';
import { TrainingCaseList } from '../../features/training/components/training-case-list';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';

const sections = [
  { to: '/training', label: 'Training cases', end: true },
  { to: '/training/courses', label: 'Courses' },
  { to: '/training/progress', label: 'Progress' },
] as const;

export function trainingLayoutLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'training');
    return null;
  };
}

export function TrainingLayout() {
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Training"
        lead="Finished cases chosen for apprentices to replay and predict, the courses they take, and how they are doing."
      />
      <SectionTabs label="Training sections" sections={sections} />
      <Outlet />
    </div>
  );
}

export function trainingCasesLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'training');
    void queryClient.prefetchQuery(trainingCasesQueryOptions());
    void queryClient.prefetchQuery(candidatesQueryOptions());
    return null;
  };
}

export function TrainingCasesRoute() {
  useDocumentTitle('Training cases');
  return (
    <div className="flex flex-col gap-6">
      <Panel labelledBy="training-cases-heading">
        <h2 id="training-cases-heading" className="mb-4 text-xl font-bold">
          Training cases
        </h2>
        <TrainingCaseList />
      </Panel>
      <Panel>
        <MarkCaseForm />
      </Panel>
    </div>
  );
}

export function coursesLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'training');
    void queryClient.prefetchQuery(coursesQueryOptions());
    void queryClient.prefetchQuery(trainingCasesQueryOptions());
    void queryClient.prefetchQuery(staffQueryOptions());
    return null;
  };
}

export function CoursesRoute() {
  useDocumentTitle('Courses · Training');
  const staff = useStaff();
  return (
    <section aria-labelledby="courses-heading" className="flex flex-col gap-4">
      <h2 id="courses-heading" className="text-xl font-bold">
        Courses
      </h2>
      <CourseList staff={staff} />
    </section>
  );
}

export function progressLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'training');
    void queryClient.prefetchQuery(progressQueryOptions());
    return null;
  };
}

export function ProgressRoute() {
  useDocumentTitle('Progress · Training');
  return (
    <section aria-label="Progress" className="flex flex-col gap-4">
      <ProgressBoard />
    </section>
  );
}
