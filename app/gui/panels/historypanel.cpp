#include "panels/historypanel.hpp"

#include "beamwarden/caution.hpp"
#include "document/labdocument.hpp"
#include "settings/settings.hpp"
#include "widgets/palette.hpp"

#include <QComboBox>
#include <QDialog>
#include <QDialogButtonBox>
#include <QFormLayout>
#include <QHBoxLayout>
#include <QHeaderView>
#include <QLabel>
#include <QLineEdit>
#include <QMessageBox>
#include <QPlainTextEdit>
#include <QPushButton>
#include <QTreeWidget>
#include <QVBoxLayout>

#include <nlohmann/json.hpp>

namespace beamwarden::gui {

namespace {

QString q(const std::string& s)
{
    return QString::fromStdString(s);
}

QString statusWords(model::AssessmentStatus s)
{
    switch (s) {
    case model::AssessmentStatus::Draft:
        return HistoryPanel::tr("draft");
    case model::AssessmentStatus::InReview:
        return HistoryPanel::tr("in review");
    case model::AssessmentStatus::Approved:
        return HistoryPanel::tr("approved");
    case model::AssessmentStatus::Withdrawn:
        return HistoryPanel::tr("withdrawn");
    }
    return {};
}

} // namespace

HistoryPanel::HistoryPanel(QWidget* parent) : QWidget(parent)
{
    m_title = new QLabel(this);
    m_title->setWordWrap(true);
    m_list = new QTreeWidget(this);
    m_list->setObjectName(QStringLiteral("historyList"));
    m_list->setHeaderLabels(
        {tr("Assessment"), tr("Status"), tr("Author"), tr("Created"), tr("Rule set"), tr("Program")});
    m_list->setAlternatingRowColors(true);
    m_record = new QPushButton(tr("Record current results as a draft"), this);
    m_signOff = new QPushButton(tr("Change status…"), this);
    auto* buttons = new QHBoxLayout;
    buttons->addWidget(m_record);
    buttons->addWidget(m_signOff);
    buttons->addStretch();
    auto* layout = new QVBoxLayout(this);
    layout->setContentsMargins(0, 0, 0, 0);
    layout->addWidget(m_title);
    layout->addWidget(m_list, 1);
    layout->addLayout(buttons);
    connect(m_record, &QPushButton::clicked, this, &HistoryPanel::recordCurrent);
    connect(m_signOff, &QPushButton::clicked, this, &HistoryPanel::signOffSelected);
}

void HistoryPanel::setDocument(LabDocument* document)
{
    m_document = document;
    connect(document, &LabDocument::assessmentsChanged, this, &HistoryPanel::reload);
}

void HistoryPanel::setLaser(int index, const assessment::LaserAssessment* current)
{
    m_laser = index;
    m_current = current;
    reload();
}

int HistoryPanel::assessmentCount() const
{
    return m_list->topLevelItemCount();
}

void HistoryPanel::reload()
{
    m_list->clear();
    const bool has = m_document && m_laser >= 0 && static_cast<std::size_t>(m_laser) < m_document->lasers().size();
    m_record->setEnabled(has && m_current != nullptr);
    m_signOff->setEnabled(has);
    if (!has) {
        m_title->setText(tr("Select a laser to see its assessments."));
        return;
    }
    const model::Laser& laser = m_document->lasers()[static_cast<std::size_t>(m_laser)];
    const auto& list = m_document->assessments(laser.id);
    m_title->setText(list.empty() ? tr("%1 has no recorded assessment yet.").arg(q(laser.name))
                                  : tr("Assessments of %1").arg(q(laser.name)));
    for (const model::Assessment& a : list) {
        auto* row = new QTreeWidgetItem(m_list);
        row->setData(0, Qt::UserRole, QVariant::fromValue<qlonglong>(a.id));
        row->setText(0, q(a.title));
        QString status = statusWords(a.status);
        if (a.outOfDate) {
            status += tr(" — out of date: the laser changed after approval");
            row->setForeground(1, palette::kVermillion);
        }
        row->setText(1, status);
        row->setText(2, q(a.author));
        row->setText(3, q(a.created));
        row->setText(4, q(a.ruleSet));
        row->setText(5, q(a.programVersion));
        for (const model::SignOff& s : a.signOffs) {
            auto* child = new QTreeWidgetItem(row);
            child->setText(0, tr("%1 → %2: %3").arg(statusWords(s.from), statusWords(s.to), q(s.comment)));
            child->setText(2, q(s.who));
            child->setText(3, q(s.when));
        }
        row->setExpanded(true);
    }
    m_list->resizeColumnToContents(0);
}

void HistoryPanel::recordCurrent()
{
    if (!m_document || !m_current || m_laser < 0)
        return;
    const model::Laser& laser = m_document->lasers()[static_cast<std::size_t>(m_laser)];
    model::Assessment a;
    a.laserId = laser.id;
    a.title = tr("Assessment of %1").arg(q(laser.name)).toStdString();
    a.ruleSet = std::string(limits::toString(m_current->options.rules));
    a.programVersion = std::string(programVersion());
    a.author = Settings::authorName().toStdString();
    a.status = model::AssessmentStatus::Draft;
    const nlohmann::json results = assessment::toJson(*m_current);
    a.results = results.dump();
    a.inputSnapshot = nlohmann::json{{"laser", laser.name},
                                     {"rule_set", a.ruleSet},
                                     {"c5_option", std::string(limits::toString(m_current->options.c5))}}
                          .dump();
    auto saved = m_document->saveAssessment(a);
    if (!saved)
        QMessageBox::warning(this, tr("Not recorded"), q(saved.error().message()));
}

void HistoryPanel::signOffSelected()
{
    const QTreeWidgetItem* item = m_list->currentItem();
    while (item && item->parent())
        item = item->parent();
    if (!m_document || !item)
        return;
    const model::RecordId id = item->data(0, Qt::UserRole).toLongLong();
    const model::Laser& laser = m_document->lasers()[static_cast<std::size_t>(m_laser)];
    const auto& list = m_document->assessments(laser.id);
    const auto found = std::find_if(list.begin(), list.end(), [&](const model::Assessment& a) { return a.id == id; });
    if (found == list.end())
        return;

    QDialog dialog(this);
    dialog.setWindowTitle(tr("Change the status of %1").arg(q(found->title)));
    auto* to = new QComboBox(&dialog);
    for (const auto s : {model::AssessmentStatus::Draft, model::AssessmentStatus::InReview,
                         model::AssessmentStatus::Approved, model::AssessmentStatus::Withdrawn}) {
        if (model::isAllowedTransition(found->status, s))
            to->addItem(statusWords(s), static_cast<int>(s));
    }
    if (to->count() == 0) {
        QMessageBox::information(this, tr("No change possible"),
                                 tr("A %1 assessment keeps its status.").arg(statusWords(found->status)));
        return;
    }
    auto* who = new QLineEdit(Settings::authorName(), &dialog);
    auto* comment = new QPlainTextEdit(&dialog);
    auto* buttons = new QDialogButtonBox(QDialogButtonBox::Ok | QDialogButtonBox::Cancel, &dialog);
    auto* form = new QFormLayout(&dialog);
    form->addRow(tr("From"), new QLabel(statusWords(found->status), &dialog));
    form->addRow(tr("To"), to);
    form->addRow(tr("Name"), who);
    form->addRow(tr("Comment"), comment);
    form->addRow(buttons);
    connect(buttons, &QDialogButtonBox::accepted, &dialog, &QDialog::accept);
    connect(buttons, &QDialogButtonBox::rejected, &dialog, &QDialog::reject);
    if (dialog.exec() != QDialog::Accepted)
        return;
    if (who->text().trimmed().isEmpty()) {
        QMessageBox::warning(this, tr("Not signed"), tr("A sign-off needs the name of who signs."));
        return;
    }
    Settings::setAuthorName(who->text().trimmed());
    model::SignOff s;
    s.who = who->text().trimmed().toStdString();
    s.from = found->status;
    s.to = static_cast<model::AssessmentStatus>(to->currentData().toInt());
    s.comment = comment->toPlainText().trimmed().toStdString();
    auto done = m_document->signOff(id, s);
    if (!done)
        QMessageBox::warning(this, tr("Not signed"), q(done.error().message()));
}

} // namespace beamwarden::gui
