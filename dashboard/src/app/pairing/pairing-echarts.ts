import { HeatmapChart } from 'echarts/charts';
import { AriaComponent, GridComponent, TooltipComponent, VisualMapPiecewiseComponent } from 'echarts/components';
import * as echarts from 'echarts/core';
import { SVGRenderer } from 'echarts/renderers';

// Only what the planner's heatmap draws; loaded with the planner's own chunk.
echarts.use([HeatmapChart, GridComponent, TooltipComponent, VisualMapPiecewiseComponent, AriaComponent, SVGRenderer]);

export { echarts };
