import { BrakeSplitBar, CamberCurveChart, FrontViewSketch } from '@templates/charts/engineering-diagrams';
import { useNumbers } from './numbers-context';
import type { NumberGroup } from '../../model/numbers/types';

/** The diagram that belongs under a group of figures, drawn from the same numbers. */
export function GroupDiagrams({ id }: { id: NumberGroup['id'] }) {
  const { diagrams } = useNumbers();
  if (id === 'brakes' && diagrams.brakes) return <div className="mt-2"><BrakeSplitBar frontPercent={diagrams.brakes.frontPercent} /></div>;
  if (id === 'frontGeometry' && diagrams.geometry) {
    return (
      <div className="mt-2 grid gap-2">
        <FrontViewSketch input={diagrams.geometry.input} centres={diagrams.geometry.centres} />
        <CamberCurveChart curve={diagrams.geometry.curve} />
      </div>
    );
  }
  return null;
}
