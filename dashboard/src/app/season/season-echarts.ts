import { BarChart, LineChart } from 'echarts/charts';
import { AriaComponent, GridComponent, LegendScrollComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { SVGRenderer } from 'echarts/renderers';

// Only what the season's charts draw (points lines, stacked entries); loaded with the season's chunk.
echarts.use([LineChart, BarChart, GridComponent, LegendScrollComponent, TooltipComponent, AriaComponent, SVGRenderer]);

export { echarts };
