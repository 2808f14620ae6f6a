package com.crustplan.card;

import java.util.Map;

import com.google.zxing.BarcodeFormat;
import com.google.zxing.EncodeHintType;
import com.google.zxing.WriterException;
import com.google.zxing.common.BitMatrix;
import com.google.zxing.qrcode.QRCodeWriter;
import com.google.zxing.qrcode.decoder.ErrorCorrectionLevel;

/**
 * A QR code (ISO/IEC 18004) of a plan's address, encoded by ZXing and drawn as one SVG
 * path: dark modules are vector fills, so the code prints sharp at any card size and
 * whatever the browser does with backgrounds.
 *
 * @param size modules per side, quiet zone included
 * @param path the dark modules as SVG path data in module units
 */
record PlanLinkCode(int size, String path) {

	/**
	 * Four modules of quiet zone, the width ISO/IEC 18004 asks for around a QR code.
	 */
	static final int QUIET_ZONE = 4;

	static PlanLinkCode of(String text) {
		BitMatrix m;
		try {
			// level M: about 15 % of the code may be smudged and it still reads (ISO/IEC
			// 18004)
			m = new QRCodeWriter().encode(text, BarcodeFormat.QR_CODE, 0, 0,
					Map.of(EncodeHintType.ERROR_CORRECTION, ErrorCorrectionLevel.M, EncodeHintType.MARGIN, QUIET_ZONE));
		}
		catch (WriterException e) {
			// an address too long for a QR code: the card prints the address as text
			// alone
			return null;
		}
		StringBuilder d = new StringBuilder();
		for (int y = 0; y < m.getHeight(); y++) {
			int x = 0;
			while (x < m.getWidth()) {
				if (!m.get(x, y)) {
					x++;
					continue;
				}
				int run = x;
				while (run < m.getWidth() && m.get(run, y)) {
					run++;
				}
				d.append('M')
					.append(x)
					.append(' ')
					.append(y)
					.append('h')
					.append(run - x)
					.append("v1h-")
					.append(run - x)
					.append('z');
				x = run;
			}
		}
		return new PlanLinkCode(m.getWidth(), d.toString());
	}

}
