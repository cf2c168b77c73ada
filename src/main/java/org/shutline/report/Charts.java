package org.shutline.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.util.List;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.CategoryLabelPositions;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.category.BarRenderer;
import org.jfree.chart.renderer.category.StandardBarPainter;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.category.DefaultCategoryDataset;

/**
 * Charts of a work plan with JFreeChart: services and meters off gas per step, and
 * customer-hours off gas per phase. Colours are two of the Okabe-Ito palette (blue
 * and vermilion), and the two series also differ in fill pattern lightness, so they
 * read in greyscale.
 */
public final class Charts {
    private static final Color BLUE = new Color(0x0072B2);
    private static final Color VERMILION = new Color(0xD55E00);

    private Charts() {}

    /** One step's figures. */
    public record StepFigure(int step, int servicesOff, int metersOff) {
    }

    /** One phase's figure. */
    public record PhaseFigure(String phase, double customerHours) {
    }

    public static JFreeChart offPerStep(String title, List<StepFigure> steps) {
        DefaultCategoryDataset ds = new DefaultCategoryDataset();
        for (StepFigure s : steps) {
            String k = Integer.toString(s.step());
            ds.addValue(s.servicesOff(), "services off", k);
            ds.addValue(s.metersOff(), "meters off", k);
        }
        CategoryAxis x = new CategoryAxis("step");
        NumberAxis y = new NumberAxis("off gas");
        y.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        BarRenderer r = bars();
        r.setSeriesPaint(0, BLUE);
        r.setSeriesPaint(1, new Color(0xE69F00));
        CategoryPlot plot = new CategoryPlot(ds, x, y, r);
        plot.setOrientation(PlotOrientation.VERTICAL);
        if (steps.size() > 20) x.setCategoryLabelPositions(CategoryLabelPositions.UP_90);
        return styled(new JFreeChart(title, font(12, Font.BOLD), plot, true));
    }

    public static JFreeChart customerHoursPerPhase(String title, List<PhaseFigure> phases) {
        DefaultCategoryDataset ds = new DefaultCategoryDataset();
        for (PhaseFigure p : phases) ds.addValue(p.customerHours(), "customer-hours off gas", p.phase());
        BarRenderer r = bars();
        r.setSeriesPaint(0, VERMILION);
        CategoryPlot plot = new CategoryPlot(ds, new CategoryAxis("phase"), new NumberAxis("customer-hours"), r);
        return styled(new JFreeChart(title, font(12, Font.BOLD), plot, false));
    }

    /** A sheet holding one chart under a title, with the caution at the foot. */
    public static Sheet sheet(JFreeChart chart, String heading) {
        return (g, w, h) -> {
            g.setColor(Color.BLACK);
            g.setFont(font(14, Font.BOLD));
            g.drawString(heading, 36f, 48f);
            chart.draw(g, new Rectangle2D.Double(36, 60, w - 72, h - 60 - 80));
            g.setFont(font(7, Font.PLAIN));
            TableSheets.Footer.paint(g, w, h, 36, null);
        };
    }

    private static BarRenderer bars() {
        BarRenderer r = new BarRenderer();
        r.setBarPainter(new StandardBarPainter());
        r.setShadowVisible(false);
        r.setDrawBarOutline(true);
        r.setDefaultOutlinePaint(Color.BLACK);
        r.setDefaultOutlineStroke(new BasicStroke(0.5f));
        return r;
    }

    private static JFreeChart styled(JFreeChart c) {
        c.setBackgroundPaint(Color.WHITE);
        c.getPlot().setBackgroundPaint(Color.WHITE);
        if (c.getPlot() instanceof CategoryPlot p) {
            p.setRangeGridlinePaint(new Color(0xBBBBBB));
            p.getDomainAxis().setTickLabelFont(font(8, Font.PLAIN));
            p.getDomainAxis().setLabelFont(font(9, Font.PLAIN));
            p.getRangeAxis().setTickLabelFont(font(8, Font.PLAIN));
            p.getRangeAxis().setLabelFont(font(9, Font.PLAIN));
        }
        if (c.getLegend() != null) c.getLegend().setItemFont(font(8, Font.PLAIN));
        TextTitle t = c.getTitle();
        if (t != null) t.setFont(font(12, Font.BOLD));
        return c;
    }

    private static Font font(int size, int style) {
        return new Font(ReportFonts.family(), style, size);
    }
}
