import Svg, { Circle, Path } from 'react-native-svg';

export type ComposerIconName = 'handle' | 'chevron-down' | 'chevron-right' | 'up' | 'down' | 'indent' | 'outdent' | 'duplicate' | 'delete' | 'undo' | 'redo' | 'history' | 'add' | 'edit' | 'findings';

type Props = { name: ComposerIconName; color: string; size?: number };

const PATHS: Record<Exclude<ComposerIconName, 'handle'>, string> = {
  'chevron-down': 'M7 10l5 5 5-5',
  'chevron-right': 'M10 7l5 5-5 5',
  up: 'M12 19V5M6 11l6-6 6 6',
  down: 'M12 5v14M6 13l6 6 6-6',
  indent: 'M4 5h16M10 10h10M10 14h10M4 19h16M4 9.5l3 2.5-3 2.5',
  outdent: 'M4 5h16M10 10h10M10 14h10M4 19h16M7 9.5L4 12l3 2.5',
  duplicate: 'M9 9h10v10H9zM5 15V5h10',
  delete: 'M5 7h14M10 7V5h4v2M7 7l1 12h8l1-12M10.5 10.5v5M13.5 10.5v5',
  undo: 'M9 14L4 9l5-5M4 9h10a6 6 0 0 1 0 12h-3',
  redo: 'M15 14l5-5-5-5M20 9H10a6 6 0 0 0 0 12h3',
  history: 'M3.5 12a8.5 8.5 0 1 0 2.5-6M3.5 4v4h4M12 8v4.5l3 2',
  add: 'M12 5v14M5 12h14',
  edit: 'M5 19l1-4 9.5-9.5 3 3L9 18zM13.5 7.5l3 3',
  findings: 'M12 4l9 15.5H3zM12 10v4.5M12 17.2v.3',
};

/** The composer's small line icons (row actions, header tools), drawn for Nightloom on a 24 grid. */
export function ComposerIcon({ name, color, size = 18 }: Props) {
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {name === 'handle' ? (
        [7, 12, 17].flatMap((y) => [9, 15].map((x) => <Circle key={`${x}-${y}`} cx={x} cy={y} r={1.4} fill={color} />))
      ) : (
        <Path d={PATHS[name]} stroke={color} strokeWidth={1.8} fill="none" strokeLinecap="round" strokeLinejoin="round" />
      )}
    </Svg>
  );
}
