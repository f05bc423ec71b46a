#include "sheetcontent.hpp"

#include "beamwarden/caution.hpp"
#include "beamwarden/limits/types.hpp"

#include <QCoreApplication>
#include <QPageSize>

#include <algorithm>
#include <cctype>
#include <string>

namespace beamwarden::sheet {

namespace {

QString fromView(std::string_view text)
{
    return QString::fromUtf8(text.data(), static_cast<qsizetype>(text.size()));
}

QStringList ruleSetNamesFor(limits::RuleChoice choice)
{
    switch (choice) {
    case limits::RuleChoice::Iec60825_1_2014:
        return {fromView(limits::fullName(limits::RuleSetId::Iec60825_1_2014))};
    case limits::RuleChoice::Iec60825_1_2007:
        return {fromView(limits::fullName(limits::RuleSetId::Iec60825_1_2007))};
    case limits::RuleChoice::Strictest:
        break;
    }
    return {fromView(limits::fullName(limits::RuleSetId::Iec60825_1_2014)),
            fromView(limits::fullName(limits::RuleSetId::Iec60825_1_2007))};
}

} // namespace

std::optional<PageSize> parsePageSize(std::string_view text)
{
    std::string lower(text);
    std::transform(lower.begin(), lower.end(), lower.begin(),
                   [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
    if (lower == "a4")
        return PageSize::A4;
    if (lower == "letter" || lower == "us-letter")
        return PageSize::Letter;
    return std::nullopt;
}

QPageLayout pageLayout(PageSize size)
{
    const QPageSize paper(size == PageSize::Letter ? QPageSize::Letter : QPageSize::A4);
    return QPageLayout(paper, QPageLayout::Portrait, QMarginsF(0, 0, 0, 0), QPageLayout::Point);
}

QString translatedCaution()
{
    // The source text lives in core so every output carries the same words; the "Caution" context offers the
    // translation the GUI's caution strip shows too.
    const std::string_view text = caution();
    const QByteArray source(text.data(), static_cast<qsizetype>(text.size()));
    return QCoreApplication::translate("Caution", source.constData());
}

SheetContent makeSheetContent(model::Lab lab, assessment::LaserAssessment assessment,
                              std::vector<model::EyewearItem> shelf, std::vector<model::Assessment> records,
                              PageSize pageSize, QString language)
{
    SheetContent content;
    content.ruleSetNames = ruleSetNamesFor(assessment.options.rules);
    content.lab = std::move(lab);
    content.assessment = std::move(assessment);
    content.shelf = std::move(shelf);
    content.records = std::move(records);
    content.programVersion = fromView(programVersion());
    content.caution = translatedCaution();
    content.pageSize = pageSize;
    content.language = std::move(language);
    return content;
}

Result<SheetContent> buildSheetContent(const model::Lab& lab, const model::Laser& laser,
                                       const std::vector<model::EyewearItem>& shelf,
                                       std::vector<model::Assessment> records,
                                       const assessment::AssessmentOptions& options, PageSize pageSize,
                                       QString language)
{
    auto assessed = assessment::assessLaser(laser, shelf, options);
    if (!assessed)
        return std::unexpected(assessed.error());
    return makeSheetContent(lab, std::move(*assessed), shelf, std::move(records), pageSize, std::move(language));
}

} // namespace beamwarden::sheet
