package lamella.ui.charts;

import java.awt.image.BufferedImage;
import java.awt.image.DataBufferInt;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.PaletteData;

/** AWT pixels to SWT pixels: a direct 24-bit palette whose masks match an INT_RGB raster, so rows copy as they are. */
final class SwtImages {

    private static final PaletteData RGB = new PaletteData(0xFF0000, 0xFF00, 0xFF);

    private SwtImages() {
    }

    static ImageData of(BufferedImage image) {
        if (image.getType() != BufferedImage.TYPE_INT_RGB) {
            throw new IllegalArgumentException("expected an INT_RGB image, got type " + image.getType());
        }
        int w = image.getWidth();
        int h = image.getHeight();
        int[] pixels = ((DataBufferInt) image.getRaster().getDataBuffer()).getData();
        ImageData data = new ImageData(w, h, 24, RGB);
        for (int y = 0; y < h; y++) {
            data.setPixels(0, y, w, pixels, y * w);
        }
        return data;
    }
}
