#include "panels/assessmentpanel.hpp"

#include "beamwarden/limits/report.hpp"
#include "models/verdictlistmodel.hpp"
#include "widgets/palette.hpp"

#include <QAbstractTextDocumentLayout>
#include <QHeaderView>
#include <QLabel>
#include <QSignalBlocker>
#include <QSplitter>
#include <QTextBrowser>
#include <QTreeView>
#include <QTreeWidget>
#include <QVBoxLayout>

namespace beamwarden::gui {

namespace {

enum class Column { Item, Mpe, Exposure, Eye, Skin, Nohd, Od, Count };
constexpr qsizetype kNamedCovering = 12; // covering items named in the summary
constexpr int kSummaryMaxHeight = 220;   // px; a longer summary scrolls
constexpr int col(Column c)
{
    return static_cast<int>(c);
}

QString q(const std::string& s)
{
    return QString::fromStdString(s);
}

QString q(std::string_view s)
{
    return QString::fromUtf8(s.data(), static_cast<qsizetype>(s.size()));
}

QString bandsText(const hazard::HazardResult& h)
{
    QStringList parts;
    for (const hazard::BandOd& band : h.bands) {
        const QString where = band.from == band.to
                                  ? q(units::format(band.from))
                                  : q(units::format(band.from)) + QStringLiteral("–") + q(units::format(band.to));
        parts << AssessmentPanel::tr("OD %1 at %2")
                     .arg(QString::number(hazard::roundOdUp(band.requiredOd), 'f', 1), where);
    }
    return parts.join(QStringLiteral("; "));
}

QColor verdictColour(bool over)
{
    return over ? palette::kVermillion : palette::kBluishGreen;
}

QColor verdictColour(eyewear::Verdict v)
{
    switch (v) {
    case eyewear::Verdict::Covers:
        return palette::kBluishGreen;
    case eyewear::Verdict::CannotTell:
        return palette::kOrange;
    case eyewear::Verdict::FallsShort:
        return palette::kVermillion;
    }
    return palette::kInk;
}

QString verdictWords(eyewear::Verdict v)
{
    switch (v) {
    case eyewear::Verdict::Covers:
        return AssessmentPanel::tr("covers");
    case eyewear::Verdict::CannotTell:
        return AssessmentPanel::tr("cannot tell");
    case eyewear::Verdict::FallsShort:
        return AssessmentPanel::tr("falls short");
    }
    return {};
}

QString exposureVerdictText(double ratio)
{
    if (ratio <= 1.0)
        return AssessmentPanel::tr("within limit");
    // Core gives "over limit ×N" with N to two significant figures; the words are translated here.
    const QString core = q(assessment::exposureVerdict(ratio));
    return AssessmentPanel::tr("over limit %1").arg(core.mid(core.indexOf(QChar(0x00d7))));
}

} // namespace

QString distanceText(const hazard::HazardDistance& d)
{
    switch (d.kind) {
    case hazard::DistanceKind::Zero:
        return AssessmentPanel::tr("0 m (below the MPE from the exit on)");
    case hazard::DistanceKind::Unbounded:
        return AssessmentPanel::tr("no finite distance");
    case hazard::DistanceKind::Finite:
        break;
    }
    return q(units::format(d.value));
}

QString exposureText(double value, bool perPulse)
{
    return perPulse ? AssessmentPanel::tr("%1 per pulse").arg(q(units::format(units::RadiantExposure::fromSi(value))))
                    : q(units::format(units::Irradiance::fromSi(value)));
}

AssessmentPanel::AssessmentPanel(QWidget* parent) : QWidget(parent)
{
    m_title = new QLabel(this);
    QFont f = m_title->font();
    f.setBold(true);
    f.setPointSizeF(f.pointSizeF() * 1.15);
    m_title->setFont(f);
    // A text view rather than a wrapped label: a label lays its rich text out afresh for each size the layouts ask
    // (natural, minimum, height for a width), every time an edit changes a figure in it. The view lays it out once
    // and takes the height the text needs, up to a limit beyond which it scrolls.
    m_summary = new QTextBrowser(this);
    m_summary->setObjectName(QStringLiteral("assessmentSummary"));
    m_summary->setFrameShape(QFrame::NoFrame);
    m_summary->setHorizontalScrollBarPolicy(Qt::ScrollBarAlwaysOff);
    m_summary->setSizePolicy(QSizePolicy::Expanding, QSizePolicy::Fixed);
    setSummaryColour(QColor());
    m_summary->setFixedHeight(0);
    connect(m_summary->document()->documentLayout(), &QAbstractTextDocumentLayout::documentSizeChanged, this,
            [this](const QSizeF& size) {
                const int needed = static_cast<int>(std::ceil(size.height())) + 2 * m_summary->frameWidth();
                m_summary->setFixedHeight(std::min(needed, kSummaryMaxHeight));
            });

    m_results = new QTreeWidget(this);
    m_results->setObjectName(QStringLiteral("assessmentResults"));
    m_results->setColumnCount(col(Column::Count));
    m_results->setHeaderLabels({tr("Output / exposure case"), tr("MPE (eye)"), tr("Exposure"), tr("Eye"), tr("Skin"),
                                tr("NOHD"), tr("Required OD")});
    m_results->setRootIsDecorated(true);
    m_results->setAlternatingRowColors(true);
    m_results->setUniformRowHeights(true);
    m_results->header()->setStretchLastSection(true);

    m_eyewearModel = new VerdictListModel({tr("Eyewear"), tr("Verdict"), tr("Margin (OD)")}, 1, this);
    m_eyewear = new QTreeView(this);
    m_eyewear->setObjectName(QStringLiteral("assessmentEyewear"));
    m_eyewear->setModel(m_eyewearModel);
    m_eyewear->setAlternatingRowColors(true);
    m_eyewear->setUniformRowHeights(true);
    // A reason reads across the columns. Spans are set when an item is opened: setting one for every reason of a
    // large shelf up front searched the view's rows once per reason.
    connect(m_eyewear, &QTreeView::expanded, this, [this](const QModelIndex& item) {
        for (int r = 0; r < m_eyewearModel->rowCount(item); ++r)
            m_eyewear->setFirstColumnSpanned(r, item, true);
    });

    m_provenance = new QTextBrowser(this);
    m_provenance->setObjectName(QStringLiteral("assessmentProvenance"));
    m_provenance->setPlaceholderText(tr("Select a result to see how it was formed."));

    auto* lower = new QSplitter(Qt::Horizontal, this);
    lower->addWidget(m_eyewear);
    lower->addWidget(m_provenance);
    lower->setSizes({520, 520});
    auto* split = new QSplitter(Qt::Vertical, this);
    split->addWidget(m_results);
    split->addWidget(lower);
    split->setSizes({300, 260});

    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(m_title);
    layout->addWidget(m_summary);
    layout->addWidget(split, 1);
    connect(m_results, &QTreeWidget::currentItemChanged, this, &AssessmentPanel::showProvenance);
    clear();
}

void AssessmentPanel::clear()
{
    m_outputs.clear();
    m_title->setText(tr("No laser selected"));
    m_summary->clear();
    m_summaryHtml.clear();
    m_results->clear();
    m_eyewearModel->clear();
    m_provenance->clear();
    m_provenanceHtml.clear();
}

void AssessmentPanel::showRefusal(const QString& laserName, const QString& message)
{
    clear();
    m_title->setText(laserName);
    m_summary->setPlainText(tr("Not assessed: %1").arg(message));
    setSummaryColour(palette::kVermillion);
}

void AssessmentPanel::setSummaryColour(const QColor& colour)
{
    if (colour == m_summaryColour && !m_summary->styleSheet().isEmpty())
        return; // a new style sheet restyles the widget: not on every edit
    m_summaryColour = colour;
    m_summary->setStyleSheet(
        colour.isValid() ? QStringLiteral("QTextBrowser { background: transparent; color: %1; }").arg(colour.name())
                         : QStringLiteral("QTextBrowser { background: transparent; }"));
}

int AssessmentPanel::resultRowCount() const
{
    int rows = m_results->topLevelItemCount();
    for (int i = 0; i < m_results->topLevelItemCount(); ++i)
        rows += m_results->topLevelItem(i)->childCount();
    return rows;
}

void AssessmentPanel::showAssessment(const assessment::LaserAssessment& a)
{
    const QString currentKey =
        m_results->currentItem() ? m_results->currentItem()->data(0, Qt::UserRole).toString() : QString();
    m_outputs = a.outputs;
    setSummaryColour(QColor());
    m_title->setText(tr("%1 — %2").arg(q(a.laser.name), q(limits::toString(a.options.rules))));
    // The verdict on the shelf first, then the notes: rich text so that a long list stays readable.
    QString html;
    if (!a.selection.singles.empty()) {
        // The leanest first (the selection's order); a large shelf's hundreds of names would bury the results.
        QStringList names;
        for (const eyewear::Choice& c : a.selection.singles) {
            if (names.size() == kNamedCovering)
                break;
            names << q(a.eyewear[c.items.front()].itemName).toHtmlEscaped();
        }
        const auto more = static_cast<int>(a.selection.singles.size()) - static_cast<int>(names.size());
        QString list = names.join(QStringLiteral(", "));
        if (more > 0)
            list = tr("%1 and %n more", nullptr, more).arg(list);
        html += QStringLiteral("<p><b>%1</b></p>").arg(tr("Covered by: %1.").arg(list));
    } else if (!a.selection.pairs.empty()) {
        const eyewear::Choice& c = a.selection.pairs.front();
        html += QStringLiteral("<p><b>%1</b></p>")
                    .arg(tr("No single item covers every output; together %1 and %2 do.")
                             .arg(q(a.eyewear[c.items[0]].itemName).toHtmlEscaped(),
                                  q(a.eyewear[c.items[1]].itemName).toHtmlEscaped()));
    } else {
        html += QStringLiteral("<p><b>%1</b> %2</p>")
                    .arg(tr("Nothing on the shelf covers this laser."), tr("A purchase needs, per output:"));
        html += QStringLiteral("<ul style='margin-top:0'>");
        for (const std::string& m : a.selection.purchaseMarkings)
            html += QStringLiteral("<li>%1</li>").arg(q(m).toHtmlEscaped());
        html += QStringLiteral("</ul>");
    }
    for (const std::string& note : a.notes)
        html += QStringLiteral("<div style='color:#5a6472'>%1</div>").arg(q(note).toHtmlEscaped());
    if (html != m_summaryHtml) { // the same words need no new layout
        m_summary->setHtml(html);
        m_summaryHtml = html;
    }

    // The selection is put back below and the provenance shown once, after the rows are rebuilt: the tree's
    // signals in between would lay out the provenance for no row and then again for the same row.
    const QSignalBlocker quiet(m_results);
    m_results->clear();
    QTreeWidgetItem* restore = nullptr;
    for (std::size_t o = 0; o < a.outputs.size(); ++o) {
        const assessment::OutputAssessment& output = a.outputs[o];
        auto* top = new QTreeWidgetItem(m_results);
        top->setText(col(Column::Item), q(output.name));
        QFont bold = top->font(0);
        bold.setBold(true);
        top->setFont(0, bold);
        for (std::size_t c = 0; c < output.cases.size(); ++c) {
            const assessment::CaseAssessment& ca = output.cases[c];
            auto* row = new QTreeWidgetItem(top);
            const QString key = QStringLiteral("%1/%2").arg(o).arg(c);
            row->setData(0, Qt::UserRole, key);
            row->setText(col(Column::Item), q(ca.name));
            row->setText(col(Column::Mpe), exposureText(ca.eye.limit, ca.eye.pulsed));
            row->setText(col(Column::Exposure), exposureText(ca.eye.exposureAtPoint, ca.eye.pulsed));
            row->setText(col(Column::Eye), exposureVerdictText(ca.eye.combinedRatio));
            row->setForeground(col(Column::Eye), verdictColour(ca.eye.combinedRatio > 1.0));
            row->setText(col(Column::Skin), exposureVerdictText(ca.skin.ratio));
            row->setForeground(col(Column::Skin), verdictColour(ca.skin.ratio > 1.0));
            row->setText(col(Column::Nohd), distanceText(ca.eye.nohd));
            row->setText(col(Column::Od), bandsText(ca.eye));
            row->setToolTip(col(Column::Od), bandsText(ca.eye));
            if (key == currentKey)
                restore = row;
        }
        top->setExpanded(true);
    }
    for (int c = 0; c < col(Column::Od); ++c)
        m_results->resizeColumnToContents(c);

    // The verdict words once each: every row shares them.
    const QString words[] = {verdictWords(eyewear::Verdict::Covers), verdictWords(eyewear::Verdict::CannotTell),
                             verdictWords(eyewear::Verdict::FallsShort)};
    const auto wordsFor = [&](eyewear::Verdict v) {
        return v == eyewear::Verdict::Covers ? words[0] : v == eyewear::Verdict::CannotTell ? words[1] : words[2];
    };
    std::vector<VerdictListModel::Row> rows;
    rows.reserve(a.eyewear.size());
    for (const assessment::EyewearOutcome& e : a.eyewear) {
        VerdictListModel::Row row;
        row.columns = {q(e.itemName), wordsFor(e.check.verdict),
                       std::isfinite(e.check.marginOd) ? QString::number(e.check.marginOd, 'f', 2) : QString()};
        row.colour = verdictColour(e.check.verdict);
        for (const eyewear::OutputCheck& oc : e.check.outputs) {
            for (const std::string& reason : oc.reasons)
                row.reasons.append(q(reason));
        }
        rows.push_back(std::move(row));
    }
    m_eyewearModel->setRows(std::move(rows));
    m_eyewear->resizeColumnToContents(0);
    m_results->setCurrentItem(restore
                                  ? restore
                                  : (m_results->topLevelItemCount() > 0 && m_results->topLevelItem(0)->childCount() > 0
                                         ? m_results->topLevelItem(0)->child(0)
                                         : nullptr));
    showProvenance();
}

void AssessmentPanel::showProvenance()
{
    const QTreeWidgetItem* item = m_results->currentItem();
    if (m_outputs.empty() || !item || item->data(0, Qt::UserRole).toString().isEmpty()) {
        m_provenance->clear();
        m_provenanceHtml.clear();
        return;
    }
    const QStringList key = item->data(0, Qt::UserRole).toString().split(QLatin1Char('/'));
    const auto& ca =
        m_outputs[static_cast<std::size_t>(key[0].toInt())].cases[static_cast<std::size_t>(key[1].toInt())];
    const hazard::HazardResult& h = ca.eye;
    const hazard::LineResult& line = h.lines[h.governingLine];
    QString html;
    html += QStringLiteral("<h3>%1</h3>").arg(tr("How this figure was formed").toHtmlEscaped());
    html += QStringLiteral("<p>") +
            tr("MPE %1 at %2 (%3), governed by %4.")
                .arg(exposureText(h.limit, h.pulsed), q(units::format(line.sample.wavelength)),
                     h.pulsed ? q(limits::toString(h.governingRule)) : tr("single exposure"),
                     line.mpe.setsTie ? tr("both rule sets (equal)") : q(limits::fullName(line.mpe.governing().set)))
                .toHtmlEscaped() +
            QStringLiteral("</p><ul>");
    for (const limits::SetOutcome& set : line.mpe.allSets()) {
        const limits::LimitTerm& term =
            set.train ? (set.train->governingRule == limits::PulseRule::SinglePulse    ? set.train->singlePulse.basis
                         : set.train->governingRule == limits::PulseRule::AveragePower ? set.train->average.basis
                                                                                       : set.train->repeated.basis)
                      : set.single.governingTerm();
        html += QStringLiteral("<li><b>%1</b>: %2<br/>%3</li>")
                    .arg(q(limits::ruleSet(set.set).name).toHtmlEscaped(),
                         q(units::format(set.limit)).toHtmlEscaped() + (set.train ? tr(" per pulse") : QString()),
                         q(limits::describeTerm(term)).toHtmlEscaped());
    }
    html += QStringLiteral("</ul><p><b>%1</b></p><ul>").arg(tr("Exposure and distance").toHtmlEscaped());
    for (const std::string& c : h.conventions)
        html += QStringLiteral("<li>%1</li>").arg(q(c).toHtmlEscaped());
    html += QStringLiteral("<li>%1</li>").arg(tr("NOHD model: %1").arg(q(h.nohd.model)).toHtmlEscaped());
    html += QStringLiteral("</ul>");
    for (const std::string& n : h.notes)
        html += QStringLiteral("<p style='color:%1'>%2</p>").arg(palette::kVermillion.name(), q(n).toHtmlEscaped());
    // Laid out afresh on every setHtml: an edit that leaves this figure's words as they were (or asks twice, once
    // for the restored selection) costs nothing.
    if (html != m_provenanceHtml) {
        m_provenanceHtml = html;
        m_provenance->setHtml(html);
    }
}

} // namespace beamwarden::gui
