// The Vega-Lite spec types the chart functions build; vega-lite exports only TopLevelSpec
// from its main entry, so the panel types come from its declared type path.
import type { Field } from 'vega-lite/types_unstable/channeldef.js';
import type { LayerSpec } from 'vega-lite/types_unstable/spec/layer.js';
import type { UnitSpec } from 'vega-lite/types_unstable/spec/unit.js';

/** One panel of a concatenated chart: a stack of layers. */
export type PanelSpec = LayerSpec<Field>;

/** One layer of a panel. */
export type LayerPart = UnitSpec<Field>;
