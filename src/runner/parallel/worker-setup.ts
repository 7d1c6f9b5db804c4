// What a pool worker does before compiling: open the project like the main thread did (hunch.yaml,
// its plugins, the canonical hash), as src/runner/worker.ts does for the single worker.

import type { RunRequest } from '../session.js';
// The worker is the composition root of its thread, so it may reach up to the records layer.
import { openProjectAt } from '../../records/open-project.js';

export async function openProjectIfAsked(request: RunRequest): Promise<void> {
  if (request.root) await openProjectAt(request.root, request.plugins ?? []);
}
