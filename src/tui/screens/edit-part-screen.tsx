import type { Part } from '../../parts/index.js';
import { PartFormScreen } from './part-form-screen.js';
import type { ScreenProps } from './screen-props.js';

export interface EditPartScreenProps extends ScreenProps {
  readonly part: Part;
}

/** A stored part in the same checked form, every value filled in; Enter saves the changes. */
export function EditPartScreen({ part, ...props }: EditPartScreenProps) {
  return <PartFormScreen {...props} editing={part} />;
}
