// zod's own messages in English for schemas built on its tree-shakeable "mini" build, which leaves the wording out
// unless asked: imported by every schema that reaches the browser, so the browser and the server word them alike.
// (Importing the full `zod` build does the same on the server, but a page that ships only `zod/mini` needs this.)
import { config } from 'zod/mini';
import en from 'zod/v4/locales/en.js';

config(en());
