#include "panels/assessmentpanel.hpp"

#include "beamwarden/limits/report.hpp"
#include "widgets/palette.hpp"

#include <QHeaderView>
#include <QLabel>
#include <QSplitter>
#include <QTextBrowser>
#include <QTreeWidget>
#include <QVBoxLayout>

namespace beamwarden::gui {

namespace {

enum class Column { Item, Mpe, Exposure, Eye, Skin, Nohd, Od, Count };
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
    m_summary = new QLabel(this);
    m_summary->setWordWrap(true);
    m_summary->setTextFormat(Qt::RichText);

    m_results = new QTreeWidget(this);
    m_results->setObjectName(QStringLiteral("assessmentResults"));
    m_results->setColumnCount(col(Column::Count));
    m_results->setHeaderLabels({tr("Output / exposure case"), tr("MPE (eye)"), tr("Exposure"), tr("Eye"), tr("Skin"),
                                tr("NOHD"), tr("Required OD")});
    m_results->setRootIsDecorated(true);
    m_results->setAlternatingRowColors(true);
    m_results->setUniformRowHeights(true);
    m_results->header()->setStretchLastSection(true);

    m_eyewear = new QTreeWidget(this);
    m_eyewear->setObjectName(QStringLiteral("assessmentEyewear"));
    m_eyewear->setColumnCount(3);
    m_eyewear->setHeaderLabels({tr("Eyewear"), tr("Verdict"), tr("Margin (OD)")});
    m_eyewear->setAlternatingRowColors(true);

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
    m_assessment.reset();
    m_title->setText(tr("No laser selected"));
    m_summary->setText(QString());
    m_results->clear();
    m_eyewear->clear();
    m_provenance->clear();
}

void AssessmentPanel::showRefusal(const QString& laserName, const QString& message)
{
    clear();
    m_title->setText(laserName);
    m_summary->setText(tr("Not assessed: %1").arg(message));
    m_summary->setStyleSheet(QStringLiteral("color: %1;").arg(palette::kVermillion.name()));
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
    m_assessment = a;
    m_summary->setStyleSheet(QString());
    m_title->setText(tr("%1 — %2").arg(q(a.laser.name), q(limits::toString(a.options.rules))));
    // The verdict on the shelf first, then the notes: rich text so that a long list stays readable.
    QString html;
    if (!a.selection.singles.empty()) {
        QStringList names;
        for (const eyewear::Choice& c : a.selection.singles)
            names << q(a.eyewear[c.items.front()].itemName).toHtmlEscaped();
        html += QStringLiteral("<p><b>%1</b></p>").arg(tr("Covered by: %1.").arg(names.join(QStringLiteral(", "))));
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
    m_summary->setText(html);

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

    m_eyewear->clear();
    for (const assessment::EyewearOutcome& e : a.eyewear) {
        auto* item = new QTreeWidgetItem(m_eyewear);
        item->setText(0, q(e.itemName));
        item->setText(1, verdictWords(e.check.verdict));
        item->setForeground(1, verdictColour(e.check.verdict));
        item->setText(2, std::isfinite(e.check.marginOd) ? QString::number(e.check.marginOd, 'f', 2) : QString());
        for (const eyewear::OutputCheck& oc : e.check.outputs) {
            for (const std::string& reason : oc.reasons) {
                auto* child = new QTreeWidgetItem(item);
                child->setText(0, q(reason));
                child->setFirstColumnSpanned(true);
            }
        }
    }
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
    if (!m_assessment || !item || item->data(0, Qt::UserRole).toString().isEmpty()) {
        m_provenance->clear();
        return;
    }
    const QStringList key = item->data(0, Qt::UserRole).toString().split(QLatin1Char('/'));
    const auto& ca =
        m_assessment->outputs[static_cast<std::size_t>(key[0].toInt())].cases[static_cast<std::size_t>(key[1].toInt())];
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
    m_provenance->setHtml(html);
}

} // namespace beamwarden::gui
