import { PartFormScreen } from './part-form-screen.js';
import type { ScreenProps } from './screen-props.js';

/** A new part typed field by field (the fields its kind uses), checked as typed; Enter saves it. */
export function AddPartScreen(props: ScreenProps) {
  return <PartFormScreen {...props} />;
}
