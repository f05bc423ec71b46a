// The body of the hazard sheet as blocks: outputs and exposure cases, eyewear with the OD plot, notes, the
// assessment record and the signatures. Each block measures itself for the content width and paints at a point.
#include "odplot.hpp"
#include "sheetlayout.hpp"
#include "sheetpalette.hpp"
#include "sheettext.hpp"
#include "sheettr.hpp"

#include <QPainter>

#include <algorithm>
#include <numeric>

namespace beamwarden::sheet {

namespace {

constexpr double kPadX = pt(3.5);
constexpr double kPadY = pt(2.2);
const QString kMark = QStringLiteral("\u2009\u2020"); // thin space and dagger: rests on a reconstructed row

QString marked(const Figure& figure)
{
    return figure.reconstructed ? figure.text + kMark : figure.text;
}

// A row of cells across the content width.
struct Table {
    std::vector<double> widths;

    [[nodiscard]] double height(const std::vector<Cell>& cells) const
    {
        double h = 0.0;
        for (std::size_t i = 0; i < cells.size() && i < widths.size(); ++i)
            h = std::max(h, cellHeight(cells[i], widths[i] - 2 * kPadX));
        return h + 2 * kPadY;
    }

    void paint(QPainter& painter, const std::vector<Cell>& cells, QPointF at, double h, const QColor& fill,
               bool isHeader = false) const
    {
        const double total = std::accumulate(widths.begin(), widths.end(), 0.0);
        if (fill.isValid())
            painter.fillRect(QRectF(at.x(), at.y(), total, h), fill);
        double x = at.x();
        for (std::size_t i = 0; i < cells.size() && i < widths.size(); ++i) {
            drawCell(painter, cells[i], QPointF(x + kPadX, at.y() + kPadY), widths[i] - 2 * kPadX);
            x += widths[i];
        }
        const double rule = isHeader ? pt(0.9) : pt(0.4);
        painter.fillRect(QRectF(at.x(), at.y() + h - rule, total, rule), isHeader ? palette::kNavy : palette::kRule);
    }
};

Table tableOf(double width, std::initializer_list<double> shares)
{
    Table t;
    for (const double s : shares)
        t.widths.push_back(width * s);
    return t;
}

Text body(const QString& text, double size = 8, QFont::Weight weight = QFont::Normal, QColor colour = palette::kInk)
{
    return Text{text, sheetFont(size, weight), colour};
}

Text muted(const QString& text, double size = 7)
{
    return Text{text, sheetFont(size), palette::kMuted};
}

Text headerText(const QString& text)
{
    return Text{text, sheetFont(7.5, QFont::Bold), palette::kNavy};
}

// Adds a table row as a block that repeats `header` above it on a new page.
void addRow(BodyBlocks& out, const Table& table, std::vector<Cell> cells, int header, bool keepWithNext,
            QColor fill = {})
{
    const double h = table.height(cells);
    out.blocks.push_back(
        Block{h, keepWithNext, header, [table, cells = std::move(cells), h, fill](QPainter& p, QPointF at) {
                  table.paint(p, cells, at, h, fill);
              }});
}

int addHeader(BodyBlocks& out, const Table& table, std::vector<Cell> cells, const QString& continuedTitle)
{
    const double h = table.height(cells);
    const Text title{continuedTitle, sheetFont(8.5, QFont::Bold), palette::kNavy};
    const double width = std::accumulate(table.widths.begin(), table.widths.end(), 0.0);
    const double titleH = textHeight(title, width) + pt(3);
    out.headers.push_back(RepeatedHeader{
        h, h + titleH,
        [table, cells = std::move(cells), h, title, titleH, width](QPainter& p, QPointF at, bool continued) {
            if (continued) {
                drawText(p, title, at, width);
                at.ry() += titleH;
            }
            table.paint(p, cells, at, h, QColor(), true);
        }});
    return static_cast<int>(out.headers.size()) - 1;
}

void addSection(BodyBlocks& out, const QString& title, double width)
{
    const Text text{title, sheetFont(10.5, QFont::Bold), palette::kNavy};
    const double above = pt(5);
    const double h = above + textHeight(text, width) + pt(2) + pt(0.8) + pt(3);
    out.blocks.push_back(Block{h, true, -1, [text, width, above](QPainter& p, QPointF at) {
                                   const double th = drawText(p, text, QPointF(at.x(), at.y() + above), width);
                                   p.fillRect(QRectF(at.x(), at.y() + above + th + pt(2), width, pt(0.8)),
                                              palette::kNavy);
                               }});
}

void addParagraph(BodyBlocks& out, Text text, double width, double below, bool keepWithNext = false)
{
    const double h = textHeight(text, width) + below;
    out.blocks.push_back(Block{h, keepWithNext, -1, [text = std::move(text), width](QPainter& p, QPointF at) {
                                   drawText(p, text, at, width);
                               }});
}

Text verdictText(const Figure& figure, bool over)
{
    return over ? Text{marked(figure), sheetFont(8, QFont::Bold), palette::kVermillion}
                : Text{marked(figure), sheetFont(8), palette::kInk};
}

void addOutputs(BodyBlocks& out, const SheetModel& m, double width)
{
    addSection(out, Sheet::tr("Outputs and exposure cases"), width);
    const Table table = tableOf(width, {0.225, 0.265, 0.125, 0.125, 0.14, 0.12});
    const int header = addHeader(out, table,
                                 {{headerText(Sheet::tr("Exposure case"))},
                                  {headerText(Sheet::tr("MPE (governing rule)"))},
                                  {headerText(Sheet::tr("Eye"))},
                                  {headerText(Sheet::tr("Skin"))},
                                  {headerText(Sheet::tr("NOHD"))},
                                  {headerText(Sheet::tr("Required OD"))}},
                                 Sheet::tr("Outputs and exposure cases (continued)"));
    for (const OutputRows& o : m.outputs) {
        // The output on one line across the table: name in bold, then its light, timing and beam.
        const QString line =
            o.name + QStringLiteral("   ") + QStringList{o.light, o.timing, o.beam}.join(QStringLiteral(" \u00b7 "));
        Text text{line, sheetFont(8), palette::kInk};
        text.boldPrefix = static_cast<int>(o.name.size());
        const Table full = tableOf(width, {1.0});
        const double h = full.height({{text}});
        out.blocks.push_back(Block{h, !o.cases.empty(), header, [full, text, h](QPainter& p, QPointF at) {
                                       full.paint(p, {{text}}, at, h, palette::kRail);
                                       p.fillRect(QRectF(at.x(), at.y(), pt(2.2), h), palette::kNavy);
                                   }});
        for (std::size_t c = 0; c < o.cases.size(); ++c) {
            const CaseRow& r = o.cases[c];
            std::vector<Cell> cells{
                {body(r.name, 8, QFont::Bold), muted(r.detail)},
                {body(marked(r.mpe)), muted(r.mpeRule)},
                {verdictText(r.eyeVerdict, r.eyeOver)},
                {verdictText(r.skinVerdict, r.skinOver)},
                {body(marked(r.nohd), 9, QFont::Bold), muted(r.nohdDetail)},
                {Text{marked(r.od), sheetFont(10, QFont::Bold), palette::kInk}},
            };
            addRow(out, table, std::move(cells), header, c + 1 < o.cases.size());
        }
    }
    addParagraph(out,
                 muted(Sheet::tr("Eye, skin: exposure at the worst point against the MPE. NOHD: beyond it the eye "
                                 "stays below the MPE. OD: rounded up, never down."),
                       7),
                 width, pt(2));
}

void addEyewear(BodyBlocks& out, const SheetModel& m, const SheetFormat& format, double width)
{
    addSection(out, Sheet::tr("Eyewear"), width);

    // Left: the verdict in a sentence, what a purchase needs, required OD per band. Right: the plot.
    const double gap = pt(12);
    const double leftWidth = width * 0.52 - gap / 2;
    const double rightWidth = width - leftWidth - gap;
    std::vector<Text> lead{body(m.eyewearSummary, 9.5, QFont::Bold)};
    if (!m.purchaseMarkings.isEmpty()) {
        lead.push_back(body(Sheet::tr("A purchase must be marked at least (and reach the required OD below):"), 8));
        for (const QString& marking : m.purchaseMarkings)
            lead.push_back(body(QStringLiteral("\u2022 ") + marking, 7.5));
    }
    double leadHeight = 0.0;
    for (const Text& t : lead)
        leadHeight += textHeight(t, leftWidth) + pt(1.5);
    leadHeight += pt(4);

    const Table bands = tableOf(leftWidth, {0.42, 0.2, 0.38});
    std::vector<std::vector<Cell>> rows;
    rows.push_back({{headerText(Sheet::tr("Wavelength (output)"))},
                    {headerText(Sheet::tr("Required OD"))},
                    {headerText(m.providedHeader)}});
    for (const BandRow& b : m.bands) {
        rows.push_back(
            {{body(b.band), muted(b.outputs)},
             {body(marked(b.required), 9, QFont::Bold)},
             {b.providedShort ? Text{b.provided, sheetFont(8, QFont::Bold), palette::kVermillion} : body(b.provided)}});
    }
    double tableHeight = 0.0;
    for (const auto& row : rows)
        tableHeight += bands.height(row);
    const bool marks =
        std::any_of(m.bands.begin(), m.bands.end(), [](const BandRow& b) { return b.required.reconstructed; });
    const Text markNote =
        muted(Sheet::tr("\u2020 rests on a reconstructed limit row: see the footnote under the outputs."), 7);
    if (marks)
        tableHeight += pt(2) + textHeight(markNote, leftWidth);
    const Text plotTitle{Sheet::tr("Required OD and eyewear OD"), sheetFont(8.5, QFont::Bold), palette::kNavy};
    const double plotNeeds = textHeight(plotTitle, rightWidth) + pt(2) + odPlotOverhead(m.plot, rightWidth) + pt(68);
    const double h = std::max(leadHeight + tableHeight, plotNeeds) + pt(8);
    const PlotData plot = m.plot;
    out.blocks.push_back(Block{h, false, -1, [=](QPainter& p, QPointF at) {
                                   double y = at.y();
                                   for (const Text& t : lead)
                                       y += drawText(p, t, QPointF(at.x(), y), leftWidth) + pt(1.5);
                                   y += pt(4);
                                   for (std::size_t i = 0; i < rows.size(); ++i) {
                                       const double rh = bands.height(rows[i]);
                                       bands.paint(p, rows[i], QPointF(at.x(), y), rh, QColor(), i == 0);
                                       y += rh;
                                   }
                                   if (marks)
                                       drawText(p, markNote, QPointF(at.x(), y + pt(2)), leftWidth);
                                   const double px = at.x() + leftWidth + gap;
                                   const double th = drawText(p, plotTitle, QPointF(px, at.y()), rightWidth);
                                   paintOdPlot(p, plot, format,
                                               QRectF(px, at.y() + th + pt(2), rightWidth, h - pt(8) - th - pt(2)));
                               }});

    // Every item on the shelf with its verdict and the first reason.
    const Table shelf = tableOf(width, {0.22, 0.13, 0.65});
    const int header = addHeader(out, shelf,
                                 {{headerText(Sheet::tr("Eyewear on the shelf"))},
                                  {headerText(Sheet::tr("Verdict"))},
                                  {headerText(Sheet::tr("Why (first reason)"))}},
                                 Sheet::tr("Eyewear on the shelf (continued)"));
    for (std::size_t i = 0; i < m.shelf.size(); ++i) {
        const ShelfRow& r = m.shelf[i];
        Cell name{body(r.name, 8, r.chosen ? QFont::Bold : QFont::Normal)};
        if (r.chosen)
            name.push_back(muted(Sheet::tr("shown in the plot")));
        const Text verdict = r.verdict == eyewear::Verdict::FallsShort
                                 ? Text{r.verdictText, sheetFont(8, QFont::Bold), palette::kVermillion}
                             : r.verdict == eyewear::Verdict::Covers
                                 ? body(r.verdictText, 8, QFont::Bold)
                                 : Text{r.verdictText, sheetFont(8, QFont::Normal, true), palette::kInk};
        addRow(out, shelf, {name, {verdict}, {body(r.reason, 7.5)}}, header, false);
    }
}

void addNotes(BodyBlocks& out, const SheetModel& m, double width)
{
    if (m.notes.isEmpty() && !m.anyReconstructed)
        return;
    // Footnotes to the table above: no heading of their own.
    out.blocks.back().height += pt(2);
    if (m.anyReconstructed) {
        Text text = body(Sheet::tr("\u2020 Rests on a limit row reconstructed from public material, not read from the "
                                   "standard's text: verify the figure against the standard before relying on it."),
                         7.5);
        text.boldPrefix = 1;
        addParagraph(out, text, width, pt(2));
    }
    for (const QString& note : m.notes)
        addParagraph(out, body(QStringLiteral("\u2022 ") + note, 7.5), width, pt(2));
}

void addRecord(BodyBlocks& out, const SheetModel& m, double width)
{
    addSection(out, Sheet::tr("Assessment record and signatures"), width);
    // The record and the signature lines below it stay together: a signature needs the status it signs.
    addParagraph(out, body(m.recordSummary, 8.5, QFont::Bold), width, pt(2), true);
    if (!m.recordWarning.isEmpty())
        addParagraph(out, Text{m.recordWarning, sheetFont(8.5, QFont::Bold), palette::kVermillion}, width, pt(1.5),
                     true);
    for (const QString& line : m.recordLines)
        addParagraph(out, body(line, 8), width, pt(1.5), true);
    if (m.signOffs.empty())
        return;
    out.blocks.back().height += pt(3);
    const Table table = tableOf(width, {0.2, 0.22, 0.22, 0.36});
    const int header = addHeader(out, table,
                                 {{headerText(Sheet::tr("When"))},
                                  {headerText(Sheet::tr("Who"))},
                                  {headerText(Sheet::tr("Status change"))},
                                  {headerText(Sheet::tr("Comment"))}},
                                 Sheet::tr("Sign-off history (continued)"));
    for (const SignOffRow& s : m.signOffs)
        addRow(out, table, {{body(s.when)}, {body(s.who)}, {body(s.change)}, {body(s.comment, 7.5)}}, header, true);
}

void addSignatures(BodyBlocks& out, const SheetModel& m, double width)
{
    out.blocks.back().height += pt(4);
    // After a sign-off history, a label keeps the two tables apart.
    if (!m.signOffs.empty())
        addParagraph(out, Text{Sheet::tr("Signatures"), sheetFont(8.5, QFont::Bold), palette::kNavy}, width, pt(1),
                     true);
    const Table table = tableOf(width, {0.28, 0.30, 0.14, 0.28});
    const std::vector<Cell> head{{headerText(Sheet::tr("Role"))},
                                 {headerText(Sheet::tr("Name"))},
                                 {headerText(Sheet::tr("Date"))},
                                 {headerText(Sheet::tr("Signature"))}};
    const QStringList roles{Sheet::tr("Laser safety officer"), Sheet::tr("Responsible for the laser"),
                            Sheet::tr("User, briefed on this sheet")};
    const double headH = table.height(head);
    // Each row is tall enough to write in and for its role (a long role wraps); the writing lines sit at its foot.
    std::vector<Text> roleTexts;
    std::vector<double> rowHeights;
    double h = headH + pt(4);
    for (const QString& role : roles) {
        roleTexts.push_back(body(role, 8.5, QFont::Bold));
        rowHeights.push_back(std::max(pt(20), textHeight(roleTexts.back(), table.widths[0] - 2 * kPadX) + pt(9)));
        h += rowHeights.back();
    }
    const Text lso = body(m.lsoName, 8.5);
    out.blocks.push_back(
        Block{h, false, -1, [=](QPainter& p, QPointF at) {
                  table.paint(p, head, at, headH, QColor(), true);
                  double y = at.y() + headH;
                  for (std::size_t i = 0; i < roleTexts.size(); ++i) {
                      const double line = y + rowHeights[i] - pt(5);
                      const double roleWidth = table.widths[0] - 2 * kPadX;
                      drawText(p, roleTexts[i], QPointF(at.x() + kPadX, line - textHeight(roleTexts[i], roleWidth)),
                               roleWidth);
                      if (i == 0 && !lso.text.isEmpty()) {
                          const double nameWidth = table.widths[1] - 2 * kPadX;
                          drawText(p, lso, QPointF(at.x() + table.widths[0] + kPadX, line - textHeight(lso, nameWidth)),
                                   nameWidth);
                      }
                      // Writing lines in the name, date and signature columns.
                      double x = at.x() + table.widths[0];
                      for (std::size_t c = 1; c < table.widths.size(); ++c) {
                          p.fillRect(QRectF(x + kPadX, line, table.widths[c] - 2 * kPadX, pt(0.7)), palette::kInk);
                          x += table.widths[c];
                      }
                      y += rowHeights[i];
                  }
              }});
}

} // namespace

BodyBlocks buildBody(const std::shared_ptr<const SheetModel>& model, const SheetFormat& format, double width)
{
    const SheetModel& m = *model;
    BodyBlocks out;
    addParagraph(out, muted(m.basisLine, 7.5), width, pt(2));
    addOutputs(out, m, width);
    // The notes concern the outputs' figures (and explain the marks in their table), so they follow it.
    addNotes(out, m, width);
    addEyewear(out, m, format, width);
    addRecord(out, m, width);
    addSignatures(out, m, width);
    return out;
}

} // namespace beamwarden::sheet
