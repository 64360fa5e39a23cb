import { BoxplotChart, ScatterChart } from 'echarts/charts';
import { AriaComponent, GridComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { SVGRenderer } from 'echarts/renderers';

// Only what the box plots draw (boxes and the mean marks); loaded with the comparison's chunk.
echarts.use([BoxplotChart, ScatterChart, GridComponent, TooltipComponent, AriaComponent, SVGRenderer]);

export { echarts };
