import { CustomChart, LineChart, ScatterChart } from 'echarts/charts';
import { AriaComponent, GridComponent, LegendComponent, MarkAreaComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { SVGRenderer } from 'echarts/renderers';

// The scatter with its regression line, and the estimates with their intervals and the published range.
echarts.use([CustomChart, LineChart, ScatterChart, AriaComponent, GridComponent, LegendComponent, MarkAreaComponent, TooltipComponent, SVGRenderer]);

export { echarts };
