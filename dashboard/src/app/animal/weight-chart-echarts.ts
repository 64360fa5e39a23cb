import { LineChart } from 'echarts/charts';
import { GridComponent, MarkLineComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { SVGRenderer } from 'echarts/renderers';

// Only what the weights chart draws, so the animal page's chunk stays small; SVG keeps the
// chart's text in the page's own font and sharp when printed.
echarts.use([LineChart, GridComponent, MarkLineComponent, TooltipComponent, SVGRenderer]);

export { echarts };
