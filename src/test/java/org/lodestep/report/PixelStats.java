package org.lodestep.report;

import java.awt.image.BufferedImage;

/** Simple pixel statistics of a region, to tell a drawn chart from an empty box. */
public record PixelStats(double meanLuma, double stdLuma, double inkFraction) {

    /** Luma statistics of a region; "ink" is any pixel at least 24 levels off the region's most common colour. */
    public static PixelStats of(BufferedImage img, int x, int y, int w, int h) {
        int x0 = Math.max(0, x);
        int y0 = Math.max(0, y);
        int x1 = Math.min(img.getWidth(), x + w);
        int y1 = Math.min(img.getHeight(), y + h);
        java.util.Map<Integer, Integer> counts = new java.util.HashMap<>();
        double sum = 0;
        double sum2 = 0;
        long n = 0;
        for (int yy = y0; yy < y1; yy++) {
            for (int xx = x0; xx < x1; xx++) {
                int rgb = img.getRGB(xx, yy) & 0xFFFFFF;
                counts.merge(rgb, 1, Integer::sum);
                double l = luma(rgb);
                sum += l;
                sum2 += l * l;
                n++;
            }
        }
        if (n == 0) {
            return new PixelStats(0, 0, 0);
        }
        int background = counts.entrySet().stream().max(java.util.Map.Entry.comparingByValue()).orElseThrow().getKey();
        double bg = luma(background);
        long ink = 0;
        for (int yy = y0; yy < y1; yy++) {
            for (int xx = x0; xx < x1; xx++) {
                if (Math.abs(luma(img.getRGB(xx, yy) & 0xFFFFFF) - bg) >= 24) {
                    ink++;
                }
            }
        }
        double mean = sum / n;
        return new PixelStats(mean, Math.sqrt(Math.max(0, sum2 / n - mean * mean)), (double) ink / n);
    }

    /** ITU-R BT.601 luma weights. */
    private static double luma(int rgb) {
        return 0.299 * ((rgb >> 16) & 0xFF) + 0.587 * ((rgb >> 8) & 0xFF) + 0.114 * (rgb & 0xFF);
    }
}
