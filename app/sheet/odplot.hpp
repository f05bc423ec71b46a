#pragma once
// The small plot on the sheet: required OD per wavelength band against the chosen eyewear's OD, wavelength on a
// logarithmic axis. Plain QPainter, so it prints and exports like the rest of the sheet.
#include "sheetformat.hpp"
#include "sheetmodel.hpp"

#include <QRectF>

class QPainter;

namespace beamwarden::sheet {

// The height the plot needs besides its axes (labels, axis title, legend) at `width`, in sheet units.
[[nodiscard]] double odPlotOverhead(const PlotData& plot, double width);
// Paints the plot with its axes, labels and legend inside `area` (sheet units).
void paintOdPlot(QPainter& painter, const PlotData& plot, const SheetFormat& format, const QRectF& area);

} // namespace beamwarden::sheet
