// What a worker thread does before compiling: open the project like the main thread did (hunch.yaml,
// its plugins, the canonical hash), when the request names the project root.

import type { RunRequest } from '../session.js';

export async function openProjectIfAsked(request: RunRequest): Promise<void> {
  if (!request.projectRoot) return;
  // Imported lazily: the records layer sits above the runner, and only worker threads need it here.
  const { openProjectAt } = await import('../../records/open-project.js');
  await openProjectAt(request.projectRoot);
}
