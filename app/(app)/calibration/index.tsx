import { CalibrationScreen } from '@/components/calibration/calibration-screen';

export default function CalibrationRoute() {
  return <CalibrationScreen />;
}
