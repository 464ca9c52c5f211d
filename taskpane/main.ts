/** Entry of the task pane bundle: starts the pane (taskpane.ts only defines it). */
import { start } from './taskpane';

start();
