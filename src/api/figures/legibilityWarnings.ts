/** The legibility check of a finished figure, as warnings a command prints. */
import type { Warning } from '../../model/errors.js';
import type { Scene } from '../../layout/scene.js';
import { figureLegibility } from '../../layout/text/figureLegibility.js';
import { measureText } from '../../render/svgWindow.js';

/** One warning per figure that the legibility check does not pass, naming the first few problems. */
export function legibilityWarnings(scene: Scene): Warning[] {
  const { total, problems } = figureLegibility(scene, { measure: measureText });
  if (total === 0) return [];
  const shown = problems.slice(0, 3).map((p) => p.message).join('; ');
  return [{ code: 'figure-legibility', message: `${scene.kind} figure: ${total} placement problem${total === 1 ? '' : 's'} could not be avoided (${shown}${total > 3 ? '; …' : ''})` }];
}
