#include "sheetlayout.hpp"

#include "sheetpalette.hpp"
#include "sheettext.hpp"
#include "sheettr.hpp"

#include <QPainter>

#include <algorithm>
#include <set>

namespace beamwarden::sheet {

namespace {

constexpr double kMarginSide = mm(15);
constexpr double kMarginTop = mm(10);
constexpr double kMarginBottom = mm(9);
constexpr double kRuleWidth = pt(1.4);

struct FirstHeader {
    Text label;
    Text name;
    Text laser;
    Text lab;
    Text room;
    Text lso;
};

FirstHeader firstHeader(const SheetModel& m)
{
    return FirstHeader{
        Text{Sheet::tr("HAZARD SHEET"), sheetFont(8.5, QFont::Bold), palette::kNavy},
        // A long name steps down in size rather than taking half the page.
        Text{m.laserName,
             sheetFont(m.laserName.size() > 48   ? 14
                       : m.laserName.size() > 26 ? 16
                                                 : 19,
                       QFont::Bold),
             palette::kInk},
        Text{m.laserLine, sheetFont(9.5), palette::kInk, Qt::AlignLeft, static_cast<int>(m.laserClass.size())},
        Text{m.labName, sheetFont(10, QFont::Bold), palette::kInk, Qt::AlignRight},
        Text{m.roomLine, sheetFont(9), palette::kInk, Qt::AlignRight},
        Text{m.lsoLine, sheetFont(9), palette::kInk, Qt::AlignRight},
    };
}

struct RunningHeader {
    Text title;
    Text lab;
};

RunningHeader runningHeader(const SheetModel& m)
{
    return RunningHeader{
        Text{Sheet::tr("%1 hazard sheet (continued)").arg(m.laserName), sheetFont(12, QFont::Bold), palette::kInk},
        Text{m.labName + QChar(QChar::LineSeparator) + m.roomLine, sheetFont(8.5), palette::kInk, Qt::AlignRight},
    };
}

constexpr double kCautionPad = pt(6);
constexpr double kCautionBar = pt(5);
constexpr double kCautionIcon = pt(22);

Text cautionText(const SheetModel& m, int page)
{
    Text text{page == 0 ? m.caution : m.shortCaution, sheetFont(page == 0 ? 9 : 8.5), palette::kInk};
    // "Caution:" (or its translation) in bold: the first words a reader meets.
    const qsizetype colon = text.text.indexOf(QLatin1Char(':'));
    if (colon > 0 && colon < 24)
        text.boldPrefix = static_cast<int>(colon + 1);
    return text;
}

double cautionTextWidth(double width)
{
    return width - kCautionBar - kCautionIcon - 2 * kCautionPad;
}

Text footerText(const SheetModel& m)
{
    return Text{m.footerLeft + QStringLiteral(" \u00b7 ") + m.documentTitle, sheetFont(7.5), palette::kMuted};
}

} // namespace

SheetLayout::SheetLayout(std::shared_ptr<const SheetModel> model, const QString& language, QSizeF paperPoints)
    : m_model(std::move(model)), m_paper(paperPoints * kUnitsPerPoint)
{
    m_left = kMarginSide;
    m_top = kMarginTop;
    m_width = m_paper.width() - 2 * kMarginSide;

    const FirstHeader h = firstHeader(*m_model);
    const double leftW = m_width * 0.5;
    const double rightW = m_width * 0.5 - pt(10);
    const double leftH = textHeight(h.label, leftW) + pt(2) + textHeight(h.name, leftW);
    const double rightH =
        pt(2) + textHeight(h.lab, rightW) + pt(2) + textHeight(h.room, rightW) + textHeight(h.lso, rightW);
    m_firstHeader = std::max(leftH, rightH) + pt(3) + textHeight(h.laser, m_width) + pt(5) + kRuleWidth + pt(9);

    const RunningHeader r = runningHeader(*m_model);
    m_runningHeader = std::max(textHeight(r.title, m_width * 0.6), textHeight(r.lab, m_width * 0.4 - pt(10))) + pt(5) +
                      kRuleWidth + pt(9);

    m_caution =
        std::max(textHeight(cautionText(*m_model, 0), cautionTextWidth(m_width)), pt(18)) + 2 * kCautionPad + pt(11);
    m_shortCaution =
        std::max(textHeight(cautionText(*m_model, 1), cautionTextWidth(m_width)), pt(18)) + 2 * kCautionPad + pt(11);
    m_footer = pt(4) + textHeight(footerText(*m_model), m_width * 0.75);

    m_body = buildBody(m_model, SheetFormat(language), m_width);
    paginate();
}

double SheetLayout::bodyTop(int page) const
{
    return m_top + (page == 0 ? m_firstHeader + m_caution : m_runningHeader + m_shortCaution);
}

double SheetLayout::bodyBottom() const
{
    return m_paper.height() - kMarginBottom - m_footer - pt(8);
}

void SheetLayout::paginate()
{
    m_pages.assign(1, {});
    double y = bodyTop(0);
    std::set<int> headersOnPage;
    std::set<int> headersPlaced;
    auto newPage = [&] {
        m_pages.emplace_back();
        y = bodyTop(static_cast<int>(m_pages.size()) - 1);
        headersOnPage.clear();
    };
    auto headerCost = [&](int header, const std::set<int>& shown) {
        if (header < 0 || shown.contains(header))
            return 0.0;
        const RepeatedHeader& h = m_body.headers[static_cast<std::size_t>(header)];
        return headersPlaced.contains(header) ? h.continuedHeight : h.height;
    };
    auto place = [&](std::size_t k) {
        const Block& block = m_body.blocks[k];
        const double cost = headerCost(block.header, headersOnPage);
        if (y + cost + block.height > bodyBottom() && !m_pages.back().empty())
            newPage();
        if (block.header >= 0 && !headersOnPage.contains(block.header)) {
            const bool continued = headersPlaced.contains(block.header);
            m_pages.back().push_back(Placed{true, block.header, y, continued});
            y += headerCost(block.header, headersOnPage);
            headersOnPage.insert(block.header);
            headersPlaced.insert(block.header);
        }
        m_pages.back().push_back(Placed{false, static_cast<int>(k), y, false});
        y += block.height;
    };

    const std::size_t count = m_body.blocks.size();
    for (std::size_t i = 0; i < count;) {
        // A group: blocks chained by keepWithNext move to a new page together when they fit on one.
        std::size_t j = i;
        while (j + 1 < count && m_body.blocks[j].keepWithNext)
            ++j;
        auto groupHeight = [&](const std::set<int>& shown) {
            std::set<int> seen = shown;
            double total = 0.0;
            for (std::size_t k = i; k <= j; ++k) {
                total += headerCost(m_body.blocks[k].header, seen) + m_body.blocks[k].height;
                if (m_body.blocks[k].header >= 0)
                    seen.insert(m_body.blocks[k].header);
            }
            return total;
        };
        if (y + groupHeight(headersOnPage) > bodyBottom() && !m_pages.back().empty()) {
            const double fresh = bodyBottom() - bodyTop(1);
            if (groupHeight({}) <= fresh)
                newPage();
        }
        for (std::size_t k = i; k <= j; ++k)
            place(k);
        i = j + 1;
    }
}

void SheetLayout::paintFrame(QPainter& painter, int page) const
{
    const SheetModel& m = *m_model;
    double y = m_top;
    if (page == 0) {
        const FirstHeader h = firstHeader(m);
        const double leftW = m_width * 0.5;
        const double rightW = m_width * 0.5 - pt(10);
        double ly = y;
        ly += drawText(painter, h.label, QPointF(m_left, ly), leftW) + pt(2);
        ly += drawText(painter, h.name, QPointF(m_left, ly), leftW);
        const double rx = m_left + m_width - rightW;
        double ry = y + pt(2);
        ry += drawText(painter, h.lab, QPointF(rx, ry), rightW) + pt(2);
        ry += drawText(painter, h.room, QPointF(rx, ry), rightW);
        ry += drawText(painter, h.lso, QPointF(rx, ry), rightW);
        drawText(painter, h.laser, QPointF(m_left, std::max(ly, ry) + pt(3)), m_width);
        y = m_top + m_firstHeader - pt(9) - kRuleWidth;
    } else {
        const RunningHeader r = runningHeader(m);
        drawText(painter, r.title, QPointF(m_left, y), m_width * 0.6);
        const double rightW = m_width * 0.4 - pt(10);
        drawText(painter, r.lab, QPointF(m_left + m_width - rightW, y), rightW);
        y = m_top + m_runningHeader - pt(9) - kRuleWidth;
    }
    painter.fillRect(QRectF(m_left, y, m_width, kRuleWidth), palette::kNavy);

    // The caution: a tinted box with a bar and a warning sign, on every page.
    const double cautionTop = m_top + (page == 0 ? m_firstHeader : m_runningHeader);
    const QRectF box(m_left, cautionTop, m_width, (page == 0 ? m_caution : m_shortCaution) - pt(11));
    painter.fillRect(box, palette::kCautionBackground);
    painter.fillRect(QRectF(box.left(), box.top(), kCautionBar, box.height()), palette::kOrange);
    painter.save();
    painter.setPen(QPen(palette::kOrange, pt(0.8)));
    painter.setBrush(Qt::NoBrush);
    painter.drawRect(box);
    painter.restore();
    const Text icon{QStringLiteral("\u26a0"), sheetFont(17, QFont::Bold), palette::kInk, Qt::AlignHCenter};
    drawText(painter, icon, QPointF(box.left() + kCautionBar + pt(3), box.top() + kCautionPad - pt(2)), kCautionIcon);
    drawText(painter, cautionText(m, page),
             QPointF(box.left() + kCautionBar + kCautionIcon + kCautionPad, box.top() + kCautionPad),
             cautionTextWidth(m_width));

    // Footer: what made the sheet, and where this page stands.
    const double footerTop = m_paper.height() - kMarginBottom - m_footer;
    painter.fillRect(QRectF(m_left, footerTop, m_width, pt(0.6)), palette::kRule);
    drawText(painter, footerText(m), QPointF(m_left, footerTop + pt(4)), m_width * 0.75);
    const Text pageText{Sheet::tr("Page %1 of %2").arg(page + 1).arg(pageCount()), sheetFont(7.5, QFont::Bold),
                        palette::kInk, Qt::AlignRight};
    drawText(painter, pageText, QPointF(m_left + m_width * 0.75, footerTop + pt(4)), m_width * 0.25);
}

void SheetLayout::paint(QPainter& painter, int page) const
{
    if (page < 0 || page >= pageCount())
        return;
    paintFrame(painter, page);
    for (const Placed& p : m_pages[static_cast<std::size_t>(page)]) {
        const QPointF at(m_left, p.y);
        if (p.isHeader)
            m_body.headers[static_cast<std::size_t>(p.index)].paint(painter, at, p.continued);
        else
            m_body.blocks[static_cast<std::size_t>(p.index)].paint(painter, at);
    }
}

} // namespace beamwarden::sheet
