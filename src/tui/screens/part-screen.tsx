import { useMemo, useState } from 'react';
import { safeText, type Part } from '../../parts/index.js';
import { ScreenFrame, frameRows } from '../components/screen-frame.js';
import { ScrollView, maxOffset } from '../components/scroll-view.js';
import { useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import type { ScreenCommand } from '../keys.js';
import { partDoc } from '../views/part-doc.js';
import type { ScreenProps } from './screen-props.js';

export interface PartScreenProps extends ScreenProps {
  readonly part: Part;
}

const COMMANDS: readonly ScreenCommand[] = [
  ['edit', 'edit: change any value of this part in a checked form'],
  'approval',
  ['substitute', 'replace: compare with an alternate part, rating by rating'],
  ['down', 'scroll down'],
  ['up', 'scroll up'],
  'pageDown',
  'pageUp',
  ['back', 'back: to the list'],
];

/** A catalog part: every rating with its test condition, and its approval trail. */
export function PartScreen({ part: given, width, height, isActive }: PartScreenProps) {
  const nav = useNavigator();
  const { catalog } = useServices();
  const [offset, setOffset] = useState(0);
  // Back from an approval change or an edit: the part and its trail as stored now, in the very
  // frame that shows the screen again (an effect would first draw the old values).
  const part = useMemo(() => catalog.find(given) ?? given, [given, catalog, isActive]);
  const history = useMemo(() => catalog.history(part), [catalog, part]);
  const lines = useMemo(() => partDoc(part, history, Math.min(width, 120)), [part, history, width]);
  const body = height - frameRows(width);
  const last = maxOffset(lines.length, body);
  const page = Math.max(1, body - 3);
  useKeys({ isActive, commands: COMMANDS }, (command) => {
    const by = command === 'down' ? 1 : command === 'up' ? -1 : command === 'pageDown' ? page : command === 'pageUp' ? -page : 0;
    if (by !== 0) setOffset((o) => Math.min(last, Math.max(0, o + by)));
    else if (command === 'approval') nav.push({ name: 'approval', part });
    else if (command === 'edit') nav.push({ name: 'edit-part', part });
    else if (command === 'substitute') nav.push({ name: 'substitute', original: part, alternate: null });
    else if (command === 'back') nav.back();
  });
  return (
    <ScreenFrame title={`Catalog › ${safeText(part.partNumber)}`} width={width} height={height} commands={COMMANDS}>
      <ScrollView lines={lines} offset={offset} height={body} />
    </ScreenFrame>
  );
}
