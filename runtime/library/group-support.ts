// The support side of the library (punching, column, footing, soil) as one list for the engine.

import type { LibFunction } from './types';
import { functions as sizeEffect } from './shear-size-effect';
import { functions as punchingPerimeter } from './punching-perimeter';
import { functions as punchingStress } from './punching-stress';
import { functions as punchingDropPanel } from './punching-drop-panel';
import { functions as punchingMomentTransfer } from './punching-moment-transfer';
import { functions as punchingOpenings } from './punching-openings';
import { functions as columnThroughFloor } from './column-through-floor';
import { functions as columnEquivalentSquare } from './column-equivalent-square';
import { functions as columnAxial } from './column-axial';
import { functions as columnSlenderness } from './column-slenderness';
import { functions as columnInteraction } from './column-interaction';
import { functions as columnBiaxial } from './column-biaxial';
import { functions as columnMoment } from './column-moment';
import { functions as columnPosition } from './column-position';
import { functions as footingArea } from './footing-area';
import { functions as footingShear } from './footing-shear';
import { functions as footingFlexure } from './footing-flexure';
import { functions as footingDevelopment } from './footing-development';
import { functions as footingBearing } from './footing-bearing';
import { functions as footingDowels } from './footing-dowels';
import { functions as soilPresumptive } from './soil-presumptive';
import { functions as soilBearingTerzaghi } from './soil-bearing-terzaghi';
import { functions as soilBearingGeneral } from './soil-bearing-general';
import { functions as soilBearingConditions } from './soil-bearing-conditions';

export const supportFunctions: LibFunction[] = [
  ...sizeEffect,
  ...punchingPerimeter,
  ...punchingStress,
  ...punchingDropPanel,
  ...punchingMomentTransfer,
  ...punchingOpenings,
  ...columnThroughFloor,
  ...columnEquivalentSquare,
  ...columnAxial,
  ...columnSlenderness,
  ...columnInteraction,
  ...columnBiaxial,
  ...columnMoment,
  ...columnPosition,
  ...footingArea,
  ...footingShear,
  ...footingFlexure,
  ...footingDevelopment,
  ...footingBearing,
  ...footingDowels,
  ...soilPresumptive,
  ...soilBearingTerzaghi,
  ...soilBearingGeneral,
  ...soilBearingConditions,
];
