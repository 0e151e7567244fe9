// A worker thread of the advice pool: TypeScript is loaded through tsx, as in the main thread.
import { register } from 'tsx/esm/api';

register();
const { runAdviceTask } = await import('./advice-worker-tasks.ts');

export default runAdviceTask;
