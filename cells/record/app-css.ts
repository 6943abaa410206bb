// The app's styles in a record: the shell keeps them in an inert template (see APP_CSS_ID)
// so the static rendering paints without them; the app adds a copy to the head as it
// starts. Imported after capture.ts, so the page kept for exporting again is unchanged.

import { APP_CSS_ID } from '../../runtime/record/app-payload';

const held = document.getElementById(APP_CSS_ID);
if (held instanceof HTMLTemplateElement) document.head.append(held.content.cloneNode(true));
