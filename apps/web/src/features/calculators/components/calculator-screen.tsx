// One calculator by its id, so the route stays a thin lookup.
import type { ComponentType } from 'react';
import type { CalculatorId } from '../calculators';
import { BoilingCalculator } from './boiling-calculator';
import { HeatFlowCalculator } from './heat-flow-calculator';
import { MixCalculator } from './mix-calculator';
import { PressureTestCalculator } from './pressure-test-calculator';
import { ProtectionCalculator } from './protection-calculator';
import { TemperatureDropCalculator } from './temperature-drop-calculator';

const screens: Record<CalculatorId, ComponentType> = {
  protection: ProtectionCalculator,
  mix: MixCalculator,
  boiling: BoilingCalculator,
  'temperature-drop': TemperatureDropCalculator,
  'pressure-test': PressureTestCalculator,
  'heat-flow': HeatFlowCalculator,
};

export function CalculatorScreen({ id }: { id: CalculatorId }) {
  const Screen = screens[id];
  return <Screen />;
}
