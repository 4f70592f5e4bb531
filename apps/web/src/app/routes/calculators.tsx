// /calculators: placeholder until the coolant package lands.
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { requireArea } from '../guards';

export function calculatorsLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'calculators');
    return null;
  };
}

export function CalculatorsRoute() {
  return <h1>Calculators</h1>;
}
