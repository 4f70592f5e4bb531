// /calculators and /calculators/:calculatorId. This module is loaded lazily (see router.tsx):
// it brings the coolant package and its mathjs units, which no other screen needs.
import type { QueryClient } from '@tanstack/react-query';
import { data, Outlet, useParams, type LoaderFunctionArgs } from 'react-router';
import { ButtonLink } from '../../components/ui/button';
import { PageHeader } from '../../components/ui/page';
import { calculators, isCalculatorId } from '../../features/calculators/calculators';
import { CalculatorIndex } from '../../features/calculators/components/calculator-index';
import { CalculatorScreen } from '../../features/calculators/components/calculator-screen';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';

export function calculatorsLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'calculators');
    return null;
  };
}

export function calculatorLoader({ params }: LoaderFunctionArgs) {
  // An unknown calculator is a missing page, shown by the frame's not-found screen.
  if (!isCalculatorId(params.calculatorId)) throw data(null, { status: 404 });
  return null;
}

export function CalculatorsLayout() {
  return <Outlet />;
}

export function CalculatorsIndexRoute() {
  useDocumentTitle('Calculators');
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Calculators"
        lead="Figures for the cooling job, each with where it comes from. Aids to judgement: the vehicle maker’s data always govern."
      />
      <CalculatorIndex />
    </div>
  );
}

export function CalculatorRoute() {
  const { calculatorId } = useParams();
  const id = isCalculatorId(calculatorId) ? calculatorId : 'protection';
  const info = calculators[id];
  useDocumentTitle(info.title);
  return (
    <div className="flex flex-col gap-6">
      <div>
        <ButtonLink to="/calculators" variant="quiet" className="-ml-4">
          <span aria-hidden="true">←</span> All calculators
        </ButtonLink>
      </div>
      <PageHeader title={info.title} lead={info.summary} />
      <CalculatorScreen id={id} />
    </div>
  );
}
