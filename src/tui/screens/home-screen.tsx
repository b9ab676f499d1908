import { Box, Text } from 'ink';
import { useEffect, useState } from 'react';
import { ScreenFrame } from '../components/screen-frame.js';
import { useHelp, useKeys } from '../hooks/use-keys.js';
import { useNavigator } from '../hooks/use-navigator.js';
import { useServices } from '../hooks/use-services.js';
import { useSyncState } from '../hooks/use-sync-state.js';
import { useTheme } from '../hooks/use-theme.js';
import type { ScreenCommand } from '../keys.js';
import type { Route } from '../state/navigation.js';
import { fit, groupDigits, wrap } from '../text/fit.js';
import type { ScreenProps } from './screen-props.js';

interface MenuItem {
  readonly key: string;
  readonly title: string;
  readonly about: string;
  readonly route: Route | 'help';
}

const COMMANDS: readonly ScreenCommand[] = [['up', 'previous'], ['down', 'next'], ['select', 'choose']];

/** What to do: a new position, a position of a design file, the catalog, a substitute, or help. */
export function HomeScreen({ width, height, isActive }: ScreenProps) {
  const theme = useTheme();
  const nav = useNavigator();
  const help = useHelp();
  const { catalog } = useServices();
  const [cursor, setCursor, getCursor] = useSyncState(0);
  // Counting a large catalog's parts takes a scan: the menu shows first, the count a moment later.
  const [isPainted, setPainted] = useState(false);
  useEffect(() => {
    const timer = setTimeout(() => setPainted(true), 0);
    return () => clearTimeout(timer);
  }, []);
  const count = isPainted ? groupDigits(catalog.count()) : null;
  const items: MenuItem[] = [
    { key: '1', title: 'New position', about: 'describe a position; see its limits and the ranked parts', route: { name: 'roles' } },
    { key: '2', title: 'Open a design file', about: 'pick a position of a design; write the chosen part into it', route: { name: 'open-design' } },
    { key: '3', title: 'Browse the catalog', about: `search all ${count ?? 'the'} parts, see ratings, change approval`, route: { name: 'browse' } },
    { key: '4', title: 'Add a part', about: 'type a new part into the catalog, checked as you go', route: { name: 'add-part' } },
    { key: '5', title: 'Check a substitute', about: 'is one part a safe drop-in for another? rating by rating', route: { name: 'substitute', original: null, alternate: null } },
    { key: '6', title: 'Keys and help', about: 'every key of the screen in view (press ? anywhere)', route: 'help' },
  ];
  const choose = (item: MenuItem) => (item.route === 'help' ? help.setOpen(true) : nav.push(item.route));
  useKeys({ isActive, commands: COMMANDS }, (command, input) => {
    if (command === 'up') setCursor((c) => Math.max(0, c - 1));
    else if (command === 'down') setCursor((c) => Math.min(items.length - 1, c + 1));
    else if (command === 'select') choose(items[getCursor()]!);
    else {
      const item = items.find((i) => i.key === input);
      if (item) choose(item);
    }
  });
  const isWide = width >= 110;
  const intro = wrap('Describe a diode position, read the limits it sets with their derivation, rank the catalog against them and write the part you choose into the design file.', width - 2);
  return (
    <ScreenFrame title="Home" width={width} height={height} commands={COMMANDS} about="Choose with ↑/↓ and Enter, or press the number.">
      <Box flexDirection="column" paddingLeft={1}>
        {intro.map((line, i) => (
          <Text key={i}>{line}</Text>
        ))}
        <Text color={theme.muted}>{fit(`Catalog: ${catalog.label} · ${count === null ? 'counting parts…' : `${count} parts`}`, width - 2)}</Text>
        <Text> </Text>
        {items.map((item, i) => (
          <Box key={item.key} flexDirection={isWide ? 'row' : 'column'}>
            <Text inverse={i === cursor} bold={i === cursor}>
              {fit(`${i === cursor ? '›' : ' '} ${item.key}  ${item.title}`, isWide ? 28 : Math.min(30, width - 2))}
            </Text>
            <Text color={theme.muted} wrap="truncate-end">
              {isWide ? '  ' : '      '}
              {item.about}
            </Text>
          </Box>
        ))}
      </Box>
    </ScreenFrame>
  );
}
