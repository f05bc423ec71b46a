// Assembles each edition's table from the shared and edition-specific rows (rows.hpp).
#include "beamwarden/limits/ruleset.hpp"

#include "rows.hpp"

#include <vector>

namespace beamwarden::limits {

namespace {

std::vector<LimitRow> concatenate(std::initializer_list<std::span<const LimitRow>> parts, bool markReconstructed)
{
    std::vector<LimitRow> all;
    for (const auto part : parts)
        all.insert(all.end(), part.begin(), part.end());
    // No public copy of the 2014 text confirms even the rows it shares with 2007 (exposure-limits.md section 4).
    if (markReconstructed) {
        for (LimitRow& row : all)
            row.status = RowStatus::Reconstructed;
    }
    return all;
}

const RuleSet& iec2007()
{
    static const std::vector<LimitRow> table =
        concatenate({rows::sharedEye(), rows::retinalShort2007(), rows::sharedSkin()}, false);
    static const RuleSet set{
        RuleSetId::Iec60825_1_2007,
        "iec60825-1:2007",
        "IEC 60825-1:2007 (ICNIRP 2000 basis)",
        "The basis of Directive 2006/25/EC (EU workplace law). Rows verified from public copies where marked; "
        "long-exposure rows and the skin table are reconstructed from continuity and public guidance.",
        table,
        rows::ti2007(),
        AlphaMaxRule::Constant100mrad,
        C7Rule::Iec2007,
        Rule3Scope::EyeThermal400nmTo1mm,
        GroupingRule::OnlyPulsesLongerThan1ns,
        10.0,
        false,
    };
    return set;
}

const RuleSet& iec2014()
{
    static const std::vector<LimitRow> table = concatenate(
        {rows::sharedEye(), rows::retinalShort2014(), rows::cornealSkinLimit2014(), rows::sharedSkin()}, true);
    static const RuleSet set{
        RuleSetId::Iec60825_1_2014,
        "iec60825-1:2014",
        "IEC 60825-1:2014 (ICNIRP 2013 basis)",
        "Most rows were reconstructed from public material, not read from the standard's text: verify a figure "
        "that rests on them against IEC 60825-1:2014 before relying on it.",
        table,
        rows::ti2014(),
        AlphaMaxRule::TimeDependent2014,
        C7Rule::Iec2014,
        Rule3Scope::RetinalThermal400To1400nm,
        GroupingRule::BothReadingsBelow1ns,
        0.0,
        true,
    };
    return set;
}

} // namespace

const RuleSet& ruleSet(RuleSetId id)
{
    return id == RuleSetId::Iec60825_1_2007 ? iec2007() : iec2014();
}

} // namespace beamwarden::limits
