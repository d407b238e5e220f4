/**
 * A label that stays readable over any shading: a copy of the text drawn first in role `label-halo` (themes
 * give it a wide stroke in the paper colour), then the text itself. Common practice on maps, no source.
 */
import type { SceneItem, SceneText } from '../scene.js';

/** The halo copy and the label, in drawing order. */
export function haloed(label: SceneText): SceneItem[] {
  return [{ ...label, role: 'label-halo' }, label];
}
