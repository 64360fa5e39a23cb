import { BarChart, CustomChart, ScatterChart } from 'echarts/charts';
import { AriaComponent, GridComponent, LegendComponent, MarkLineComponent, TooltipComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { SVGRenderer } from 'echarts/renderers';

// Only what the sire & dam chart draws: bars, interval whiskers (custom), shrunken-rate markers.
echarts.use([BarChart, CustomChart, ScatterChart, AriaComponent, GridComponent, LegendComponent, MarkLineComponent, TooltipComponent, SVGRenderer]);

export { echarts };
