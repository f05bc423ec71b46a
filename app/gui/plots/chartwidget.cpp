#include "plots/chartwidget.hpp"

#include "plots/plotgrid.hpp"
#include "widgets/palette.hpp"

#include <QAreaSeries>
#include <QCategoryAxis>
#include <QChart>
#include <QChartView>
#include <QFileInfo>
#include <QGraphicsLayout>
#include <QGraphicsRectItem>
#include <QGraphicsScene>
#include <QGraphicsSimpleTextItem>
#include <QImage>
#include <QLegendMarker>
#include <QLineSeries>
#include <QPainter>
#include <QScatterSeries>
#include <QSvgGenerator>
#include <QVBoxLayout>
#include <QValueAxis>

#include <algorithm>
#include <cmath>
#include <functional>

namespace beamwarden::gui {

namespace {

const QColor kGrid{0xDD, 0xE3, 0xEA};
const QColor kAxisLine{0x8A, 0x94, 0xA3};
constexpr qreal kLabelZ = 20;
constexpr qreal kGridZ = 2; // above the plot area's background, below the axes and series (the library's order)
const QSize kExportMinimum{1000, 620};
constexpr int kExportPixelRatio = 2;

Qt::PenStyle penStyle(LineStyle style)
{
    switch (style) {
    case LineStyle::Solid:
        return Qt::SolidLine;
    case LineStyle::Dashed:
        return Qt::DashLine;
    case LineStyle::Dotted:
        return Qt::DotLine;
    case LineStyle::DashDot:
        return Qt::DashDotLine;
    case LineStyle::DashDotDot:
        return Qt::DashDotDotLine;
    }
    return Qt::SolidLine;
}

bool isFinite(QPointF p)
{
    return std::isfinite(p.x()) && std::isfinite(p.y());
}

// A round interval giving about `wanted` ticks over the span: 1, 2 or 5 times a power of ten.
double niceInterval(double span, int wanted)
{
    if (!(span > 0))
        return 1;
    const double raw = span / wanted;
    const double decade = std::pow(10.0, std::floor(std::log10(raw)));
    for (const double factor : {1.0, 2.0, 5.0, 10.0}) {
        if (raw <= factor * decade)
            return factor * decade;
    }
    return 10 * decade;
}

QFont scaledFont(const QFont& base, double factor, bool bold = false)
{
    QFont font = base;
    font.setPointSizeF(base.pointSizeF() * factor);
    font.setBold(bold);
    return font;
}

} // namespace

ChartWidget::ChartWidget(QWidget* parent) : QWidget(parent)
{
    m_chart = new QChart;
    m_chart->setBackgroundRoundness(0);
    m_chart->setMargins(QMargins(4, 4, 22, 4)); // room for the last tick label at the right edge
    m_chart->layout()->setContentsMargins(0, 0, 0, 0);
    m_chart->setBackgroundBrush(Qt::white);
    m_chart->setTitleFont(scaledFont(font(), 1.05, true));
    m_chart->setTitleBrush(palette::kNavy);
    m_chart->legend()->setAlignment(Qt::AlignBottom);
    m_chart->legend()->setMarkerShape(QLegend::MarkerShapeFromSeries);
    m_chart->legend()->setFont(scaledFont(font(), 0.9));
    m_chart->legend()->setLabelColor(palette::kInk);

    m_gridItem = new PlotGrid(kGrid, kAxisLine, m_chart);
    m_gridItem->setZValue(kGridZ);

    m_view = new QChartView(m_chart, this);
    m_view->setRenderHint(QPainter::Antialiasing);
    m_view->setFrameShape(QFrame::NoFrame);
    m_view->setMinimumSize(320, 220);

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(m_view);

    connect(m_chart, &QChart::plotAreaChanged, this, [this] {
        updateDecadeLabels();
        placeLabels();
        updateGrid();
    });
}

ChartWidget::~ChartWidget() = default;

void ChartWidget::clear()
{
    for (PlacedLabel& label : m_labels)
        delete label.box;
    m_labels.clear();
    m_anchor = nullptr;
    m_x.axis = nullptr; // a layout pass during the removal must not reach a deleted axis
    m_y.axis = nullptr;
    m_chart->removeAllSeries(); // deletes them, and the area series' boundary lines they own
    for (QAbstractAxis* axis : m_chart->axes()) {
        m_chart->removeAxis(axis);
        delete axis;
    }
    m_drawn.clear();
    m_gridItem->setLines({}, {});
    m_guides.clear();
    m_x = {};
    m_y = {};
    m_title.clear();
    m_chart->setTitle({});
    m_shape = {};
    m_hasContent = false;
}

void ChartWidget::setContent(const ChartContent& content)
{
    Shape shape = shapeOf(content);
    if (m_hasContent && shape == m_shape) {
        refresh(content);
        return;
    }
    clear();
    rebuild(content);
    m_shape = std::move(shape);
    m_hasContent = true;
}

void ChartWidget::setTitles(const ChartContent& content)
{
    m_title = content.title;
    QString title = content.title.toHtmlEscaped();
    if (!content.subtitle.isEmpty())
        title += QStringLiteral("<br><span style=\"font-weight: normal; font-size: small;\">%1</span>")
                     .arg(content.subtitle.toHtmlEscaped());
    if (m_chart->title() != title) // the title is rich text: laying it out again is not free
        m_chart->setTitle(title);
}

void ChartWidget::rebuild(const ChartContent& content)
{
    setTitles(content);
    m_x.spec = content.x;
    m_y.spec = content.y;
    m_chart->addAxis(makeAxis(m_x, Qt::Horizontal), Qt::AlignBottom);
    m_chart->addAxis(makeAxis(m_y, Qt::Vertical), Qt::AlignLeft);

    for (const ChartCurve& curve : content.curves)
        addCurve(curve);
    for (const ChartGuide& guide : content.guides)
        addGuide(guide);
    for (const ChartMarker& marker : content.markers)
        addMarker(marker);
    for (const ChartLabel& label : content.labels)
        addLabel(label);
    updateDecadeLabels();
    placeLabels();
    updateGrid();
}

QPointF ChartWidget::toChart(QPointF value) const
{
    return toChart(value, m_x.spec, m_y.spec);
}

QPointF ChartWidget::fromChart(QPointF chart) const
{
    const double x = m_x.spec.scale == AxisScale::Log10 ? std::pow(10.0, chart.x()) : chart.x();
    const double y = m_y.spec.scale == AxisScale::Log10 ? std::pow(10.0, chart.y()) : chart.y();
    return {x, y};
}

QAbstractAxis* ChartWidget::makeAxis(AxisState& state, Qt::Orientation orientation)
{
    const ChartAxis& spec = state.spec;
    QAbstractAxis* axis = nullptr;
    if (spec.scale == AxisScale::Log10) {
        // Qt's log axis prints ticks with a printf format only; a category axis over log10 values lets every
        // decade carry words such as "1 ns" or "10 cm".
        auto* categories = new QCategoryAxis;
        categories->setLabelsPosition(QCategoryAxis::AxisLabelsPositionOnValue);
        axis = categories;
    } else {
        auto* values = new QValueAxis;
        values->setTickType(QValueAxis::TicksDynamic);
        values->setTickAnchor(0);
        values->setMinorTickCount(0);
        axis = values;
    }
    state.axis = axis;
    setAxisRange(state, orientation);
    axis->setTruncateLabels(false); // our labels are short words; "…" would hide them
    axis->setTitleText(spec.title);
    axis->setTitleFont(scaledFont(font(), 0.95));
    axis->setTitleBrush(palette::kInk);
    axis->setLabelsFont(scaledFont(font(), 0.85));
    axis->setLabelsColor(palette::kInk);
    axis->setGridLineVisible(false); // PlotGrid draws the grid, the axis line and the ticks
    axis->setLineVisible(false);
    state.step = 0;
    return axis;
}

void ChartWidget::setAxisRange(AxisState& state, Qt::Orientation orientation)
{
    const ChartAxis& spec = state.spec;
    if (auto* categories = qobject_cast<QCategoryAxis*>(state.axis)) {
        categories->setRange(std::log10(spec.min), std::log10(spec.max));
        categories->setStartValue(std::log10(spec.min));
    } else if (auto* values = qobject_cast<QValueAxis*>(state.axis)) {
        values->setRange(spec.min, spec.max);
        const double interval = spec.tickInterval > 0
                                    ? spec.tickInterval
                                    : niceInterval(spec.max - spec.min, orientation == Qt::Horizontal ? 8 : 5);
        values->setTickInterval(interval);
        state.interval = interval;
        values->setLabelFormat(interval >= 1 ? QStringLiteral("%.0f") : QStringLiteral("%.2g"));
    }
}

void ChartWidget::updateDecadeLabels()
{
    const QRectF area = m_chart->plotArea();
    if (m_x.axis != nullptr)
        updateLogAxis(m_x, area.width(), m_x.spec.ticks == TickStyle::PowerOfTen ? 46 : 62);
    if (m_y.axis != nullptr)
        updateLogAxis(m_y, area.height(), 22);
}

void ChartWidget::updateLogAxis(AxisState& state, double extentPx, double pxPerLabel)
{
    auto* axis = qobject_cast<QCategoryAxis*>(state.axis);
    if (axis == nullptr)
        return;
    const int first = static_cast<int>(std::ceil(std::log10(state.spec.min) - 1e-9));
    const int last = static_cast<int>(std::floor(std::log10(state.spec.max) + 1e-9));
    const int room = std::max(2, static_cast<int>(extentPx / pxPerLabel));
    const int step = decadeStep(last - first, room, state.spec.ticks);
    if (step == state.step)
        return; // only rebuild when the spacing changes: rebuilding moves the plot area, which calls us again
    state.step = step;
    for (const QString& label : axis->categoriesLabels())
        axis->remove(label);
    // Only labelled decades are categories (the library hides a label that overlaps its neighbour, blank or not);
    // every decade gets its grid line from updateGrid().
    for (int e = first; e <= last; ++e) {
        if (((e % step) + step) % step == 0)
            axis->append(decadeLabel(e, state.spec.ticks), e);
    }
}

void ChartWidget::attach(QXYSeries* series)
{
    m_chart->addSeries(series);
    series->attachAxis(m_x.axis);
    series->attachAxis(m_y.axis);
    if (m_anchor == nullptr)
        m_anchor = series;
}

void ChartWidget::addCurve(const ChartCurve& curve)
{
    // Each finite run is drawn as its own piece, only the first named in the legend.
    const std::vector<QList<QPointF>> runs = piecesOf(curve, m_x.spec, m_y.spec);
    QPen pen(curve.colour, curve.width, penStyle(curve.style), Qt::FlatCap, Qt::MiterJoin);
    Drawn drawn{curve.name, {}};
    for (std::size_t i = 0; i < runs.size(); ++i) {
        QXYSeries* piece = nullptr;
        if (curve.filled) {
            auto* upper = new QLineSeries;
            upper->append(runs[i]);
            auto* area = new QAreaSeries(upper);
            upper->setParent(area);
            QColor fill = curve.colour;
            fill.setAlpha(70);
            area->setBrush(fill);
            area->setPen(pen);
            area->setName(curve.name);
            m_chart->addSeries(area);
            area->attachAxis(m_x.axis);
            area->attachAxis(m_y.axis);
            if (m_anchor == nullptr)
                m_anchor = area;
            piece = upper;
            if (i > 0 || curve.name.isEmpty()) {
                for (QLegendMarker* marker : m_chart->legend()->markers(area))
                    marker->setVisible(false);
            }
        } else {
            auto* line = new QLineSeries;
            line->append(runs[i]);
            line->setPen(pen);
            line->setName(curve.name);
            attach(line);
            piece = line;
            if (i > 0 || curve.name.isEmpty()) {
                for (QLegendMarker* marker : m_chart->legend()->markers(line))
                    marker->setVisible(false);
            }
        }
        drawn.pieces.push_back(piece);
    }
    m_drawn.push_back(std::move(drawn));
}

void ChartWidget::addGuide(const ChartGuide& guide)
{
    auto* line = new QLineSeries;
    const double x = m_x.spec.scale == AxisScale::Log10 ? std::log10(guide.x) : guide.x;
    const double y0 = m_y.spec.scale == AxisScale::Log10 ? std::log10(m_y.spec.min) : m_y.spec.min;
    const double y1 = m_y.spec.scale == AxisScale::Log10 ? std::log10(m_y.spec.max) : m_y.spec.max;
    line->append(x, y0);
    line->append(x, y1);
    line->setPen(QPen(guide.colour, 1.5, Qt::DashLine));
    attach(line);
    m_guides.push_back(line);
    for (QLegendMarker* marker : m_chart->legend()->markers(line))
        marker->setVisible(false);
}

void ChartWidget::addMarker(const ChartMarker& marker)
{
    auto* scatter = new QScatterSeries;
    switch (marker.shape) {
    case MarkerShape::Circle:
        scatter->setMarkerShape(QScatterSeries::MarkerShapeCircle);
        break;
    case MarkerShape::Diamond:
        scatter->setMarkerShape(QScatterSeries::MarkerShapeRotatedRectangle);
        break;
    case MarkerShape::Square:
        scatter->setMarkerShape(QScatterSeries::MarkerShapeRectangle);
        break;
    }
    scatter->setMarkerSize(11);
    scatter->setColor(marker.colour);
    scatter->setBorderColor(Qt::white);
    scatter->setName(marker.name);
    if (isFinite(marker.point))
        scatter->append(toChart(marker.point));
    attach(scatter);
    m_drawn.push_back(Drawn{marker.name, {scatter}});
}

void ChartWidget::addLabel(const ChartLabel& label)
{
    if (!isFinite(label.at))
        return;
    auto* box = new QGraphicsRectItem(m_chart);
    box->setPen(Qt::NoPen);
    box->setBrush(QColor(255, 255, 255, 225));
    box->setZValue(kLabelZ);
    auto* text = new QGraphicsSimpleTextItem(label.text, box);
    text->setFont(scaledFont(font(), 0.88, true));
    text->setBrush(label.colour);
    const QRectF bounds = text->boundingRect();
    text->setPos(3, 1);
    box->setRect(0, 0, bounds.width() + 6, bounds.height() + 2);
    m_labels.push_back(PlacedLabel{toChart(label.at), label.placement, box});
}

void ChartWidget::placeLabels()
{
    if (m_anchor == nullptr)
        return;
    const QRectF area = m_chart->plotArea();
    for (const PlacedLabel& label : m_labels) {
        const QPointF p = m_chart->mapToPosition(label.at, m_anchor);
        const QRectF r = label.box->rect();
        double x = p.x() + 7;
        if (x + r.width() > area.right() - 2)
            x = p.x() - 7 - r.width();
        x = std::max(x, area.left() + 2);
        double y = label.placement == LabelPlacement::Above ? p.y() - r.height() - 5 : p.y() + 5;
        y = std::clamp(y, area.top() + 2, std::max(area.top() + 2, area.bottom() - r.height() - 2));
        label.box->setPos(x, y);
    }
}

QString ChartWidget::seriesName(int index) const
{
    if (index < 0 || index >= seriesCount())
        return {};
    return m_drawn[static_cast<std::size_t>(index)].name;
}

std::vector<QPointF> ChartWidget::seriesPoints(int index) const
{
    std::vector<QPointF> points;
    if (index < 0 || index >= seriesCount())
        return points;
    for (const QXYSeries* piece : m_drawn[static_cast<std::size_t>(index)].pieces) {
        for (const QPointF& p : piece->points())
            points.push_back(fromChart(p));
    }
    return points;
}

QStringList ChartWidget::labelTexts() const
{
    QStringList texts;
    for (const PlacedLabel& label : m_labels) {
        for (const QGraphicsItem* child : label.box->childItems()) {
            if (const auto* text = qgraphicsitem_cast<const QGraphicsSimpleTextItem*>(child))
                texts.append(text->text());
        }
    }
    return texts;
}

void ChartWidget::renderAt(QSize size, const std::function<void(QPainter&)>& begin)
{
    // The chart is laid out afresh at the export size (labels and tick spacing follow), painted, then put back.
    const QSizeF shown = m_chart->size();
    m_chart->resize(size);
    m_chart->layout()->activate();
    m_chart->layout()->activate(); // again, for the tick labels rebuilt for the new size
    QPainter painter;
    begin(painter);
    if (painter.isActive()) {
        painter.setRenderHint(QPainter::Antialiasing);
        painter.setRenderHint(QPainter::TextAntialiasing);
        m_chart->scene()->render(&painter, QRectF(QPointF(0, 0), size), QRectF(m_chart->pos(), size));
        painter.end();
    }
    m_chart->resize(shown);
    m_chart->layout()->activate();
    m_chart->layout()->activate();
}

bool ChartWidget::exportTo(const QString& path)
{
    const QString suffix = QFileInfo(path).suffix().toLower();
    if (suffix != QStringLiteral("png") && suffix != QStringLiteral("svg"))
        return false;
    // As large as shown, and never smaller than a readable page-width figure.
    const QSize size = (m_view->isVisible() ? m_view->size() : QSize()).expandedTo(kExportMinimum);
    if (suffix == QStringLiteral("png")) {
        QImage image(size * kExportPixelRatio, QImage::Format_ARGB32_Premultiplied);
        image.setDevicePixelRatio(kExportPixelRatio);
        image.fill(Qt::white);
        renderAt(size, [&](QPainter& painter) { painter.begin(&image); });
        return image.save(path, "PNG");
    }
    QSvgGenerator generator;
    generator.setFileName(path);
    generator.setSize(size);
    generator.setViewBox(QRect(QPoint(0, 0), size));
    generator.setTitle(m_title);
    generator.setDescription(tr("Chart exported from Beamwarden"));
    bool begun = false;
    renderAt(size, [&](QPainter& painter) { begun = painter.begin(&generator); });
    return begun && QFileInfo(path).size() > 0;
}

} // namespace beamwarden::gui
