import { FitCalculator } from '@/features/fit-calculator/components/fit-calculator';

export function FitCalculatorRoute() {
  return <FitCalculator />;
}
