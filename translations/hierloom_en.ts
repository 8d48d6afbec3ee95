<?xml version="1.0" encoding="utf-8"?>
<!DOCTYPE TS>
<TS version="2.1" language="en" sourcelanguage="en">
<context>
    <name>AnimalMatcher</name>
    <message>
        <source>... (%1 in all)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&apos;%1&apos; matches %2; type more</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>QObject</name>
    <message>
        <source>&amp;Print Hierarchy Report...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save Hierarchy Report as P&amp;DF...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save Hierarchy Report</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>PDF (*.pdf)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Make the Report</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Hierloom %1</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::core::DisplayName</name>
    <message>
        <source>animal id</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui</name>
    <message>
        <source>Line</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Time</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Winner</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Loser</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Outcome</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Behaviour</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Note</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Entered</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>no observer</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>draw</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>decided</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>earlier (%1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>this session</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>female</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>male</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>sex unknown</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>1 year</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 years</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>age unknown</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>group %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>in no group that day</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>left the colony on %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>New Group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>There is no group &apos;%1&apos; in the colony. Create a new group named &apos;%1&apos;?</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Supporters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>winner&apos;s side: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>loser&apos;s side: %1</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::AboutDialog</name>
    <message>
        <source>Qt %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>LGPL-3.0</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>windows, tables, help</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>QCustomPlot %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>GPL-3.0</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>plots</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>SQLite</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>public domain</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>the colony file</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>CLI11</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>BSD-3-Clause</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>command-line options</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>GoogleTest</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>tests only, not shipped</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&lt;h2&gt;Hierloom %1&lt;/h2&gt;&lt;p&gt;Dominance ranks and their inheritance in animal colonies.&lt;/p&gt;&lt;p&gt;Copyright &amp;copy; the Hierloom authors.&lt;br&gt;This program is free software: you can redistribute it and/or modify it under the terms of the GNU General Public License as published by the Free Software Foundation, either version 3 of the License, or (at your option) any later version (GPL-3.0-or-later). It comes with ABSOLUTELY NO WARRANTY.&lt;/p&gt;&lt;p&gt;Built with:&lt;/p&gt;</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Library</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Licence</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Used for</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>About Hierloom</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::AnalysisSettingsDialog</name>
    <message>
        <source>Analysis Settings</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Logistic</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Normal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Count half to each side</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Ignore</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> years</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> days</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>All data</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo &amp;k factor:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo &amp;start value:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Expectation &amp;curve:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Draws:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Maturity age:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Default &amp;window (last days):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Kept in the colony file and used by every view, the report and hierloom-cli (whose options override them for one run). Defaults: %1.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony is open read-only, so they cannot be changed.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Start value for everyone</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Youngest ascendancy: just below her mother</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Eldest first: just below her last older sister</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Where a daughter whose mother is rated enters the Elo ranking: between the animal the rule puts just above her and the one rated below that animal (docs: Rule-informed Elo). Used by rank tables, rank changes and the report; the comparisons with the inheritance rule keep the plain start.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Daughters&apos; Elo sta&amp;rt:</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::AnimalEditorDialog</name>
    <message>
        <source>Add Animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Edit Animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record Birth</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record Introduction</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>female</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>male</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>unknown</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>founder</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>born</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>introduced</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(not recorded)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(still present)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>died</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>removed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Id:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Name:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Sex:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Born on:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Birth date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Mother:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Father:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Introduced on:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Entry date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Entry &amp;type:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>E&amp;xit date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Exit t&amp;ype:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The newborn lives in the group its mother was in on that day.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(unknown)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No mother chosen.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>an unknown mother</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record the birth of %1 to %2 on %3?</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record the introduction of %1 into group %2 on %3?</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::AnimalTableModel</name>
    <message>
        <source>removed %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>died %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>present</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>F</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>M</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>?</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>ID</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Name</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Sex</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Born</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Age</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Mother</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Matriarch</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group now</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Status</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::AnimalView</name>
    <message>
        <source>ID, name, mother or matriarch</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>F&amp;ind:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>All animals</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Present only</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Show:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 of %2 animals</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::BackupActions</name>
    <message>
        <source>Restore from Backup</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Taken</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Size</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>File</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Restore...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>There are no backups of this colony yet.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Backups in %1, newest first:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Back Up Now</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Restore from Backup...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Merge Another Colony...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Back Up the Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Replace every record of %1 with the backup %2?

The colony as it is now is backed up first, so this can be reversed by restoring that backup.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Restore the Backup</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Open Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Scheduled Backup Failed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Colony File Damaged</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1

The newest backup of this colony was taken %2. Restore it over the damaged file and open it? The damaged file is kept in the backup folder.</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::CentreOverviewModel</name>
    <message>
        <source>no encounters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>calm</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>alert</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Counter-dominance</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank changes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severe aggression</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No encounters of this group up to %1: there is nothing to watch.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The monthly stability watch raised no alert in the group&apos;s last month up to %1.</source>
        <translation type="unfinished"></translation>
    </message>
    <message numerus="yes">
        <source>The monthly stability watch raised %n alert(s) in the group&apos;s last month up to %1; the Alerts column says which.</source>
        <translation type="unfinished">
            <numerusform></numerusform>
            <numerusform></numerusform>
        </translation>
    </message>
    <message>
        <source>The Stability view shows the evidence period by period.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Enter or double-click: this group in the Hierarchy view</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animals</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Adult females</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Matrilines</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Last encounter</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Encounters, 30 days</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Stability</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Alerts</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animals resident in the group on the day</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Resident females at or past the maturity age on the day</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Distinct matrilines among the resident females</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The group&apos;s last encounter up to the day</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The group&apos;s encounters in the 30 days ending on the day, draws included</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The monthly stability watch in the group&apos;s last month up to the day</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The alerts of that month; the tooltip of a row gives the evidence</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::CentreOverviewView</name>
    <message>
        <source>the overview, group by group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>last encounter</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The day of the overview (2026-10-05 or 20261005); empty: the colony&apos;s last encounter</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>O&amp;n:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Encounters in the last 30 days</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>alert in the last month</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No encounters yet: give a day.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1: groups %2, with alerts in their last month %3</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ColonyDocument</name>
    <message>
        <source>another colony file was opened</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>the colony was closed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>another program changed %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Another program changed %1 while it was open here, and it cannot be read again; the undo history was emptied. Nothing more is written until it can be read.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Another program changed %1; it was read again and the undo history emptied (encounters %2 → %3, animals %4 → %5), so Undo cannot change records this window did not write.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Not every encounter of %1 could be read: %2</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ColonyEditFacade</name>
    <message>
        <source>No colony is open.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony is open read-only; open it for writing to change it.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Enter %1 over %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Edit encounter %1 over %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Add animal %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Introduce %1 into %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Birth of %1 to %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Edit animal %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Death of %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Removal of %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Move %1 to %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Edit behaviour codes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Edit observers</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Delete 1 encounter</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Delete %1 encounters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>This encounter is no longer in the file (another program may have deleted it); nothing was changed.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The encounter %1 over %2 is no longer in the file (another program may have deleted it); nothing was deleted.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Change stability thresholds</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Set species %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Change analysis settings</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>A saved scenario needs a name.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save scenario %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Delete scenario %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>an import added records outside the undo history</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>a merge added records outside the undo history</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>the colony was restored from a backup</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>A saved mapping needs a name.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save import mapping %1</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::DemoColony</name>
    <message>
        <source>Cannot create the folder %1 for the demo colony.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot replace the old demo colony %1: %2</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::EditMenus</name>
    <message>
        <source>&amp;Edit</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Undo</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Redo</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Evening &amp;Entry</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Behaviour Codes...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Observers...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Pedigree</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Add Animal...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Edit Animal...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record &amp;Birth...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record &amp;Death...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record &amp;Removal...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record &amp;Introduction...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Move Between Groups...</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::EncounterEntryPanel</name>
    <message>
        <source>1 line</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 lines</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>1 animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 animals</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>1 warning</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 warnings</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Possible Duplicate</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>HH:MM</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>id or name</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>note</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Time</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Winner</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Loser</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Behaviour</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Note</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&apos;%1&apos; is not a time of day in the form HH:MM (24 h)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony has no groups yet: add animals first.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No animal lived in this group on that day.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>at %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>without a time</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Not saved: a possible duplicate.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Changing line %1: Enter saves it, Esc cancels.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Session ended: %1, group %2, observer %3: %4, %5, %6.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(none)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Undo Whole Session</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>End Session</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Draw</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Add Line (%1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>YYYY-MM-DD</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observer:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Edit Line (%1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Delete Line (%1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Refused lines (Enter on one puts it back on the line; Esc clears the line):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>This date and group in the file (each line is saved as it is entered):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>In the evening entry</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose the observer (or type &apos;unknown&apos;); a line needs one</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>in this session</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>in the file for this day</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 and %2 %3 are already %4. Save this line as another encounter?</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 earlier</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The table was read again from the file; nothing was deleted. Choose the line again.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Take back the %1 entered in this session for %2, group %3? Earlier lines stay.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>ids or names, separated by spaces</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Winner&apos;s supporters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Loser&apos;s supporters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Delete the session of %1 (%2)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::EncounterTableModel</name>
    <message>
        <source>draw</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>decided</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Date</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Time</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Winner</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Loser</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Outcome</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Behaviour</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observer</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Note</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Winner&apos;s supporters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Loser&apos;s supporters</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::EncounterView</name>
    <message>
        <source>Fr&amp;om</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;To</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>A&amp;nimal:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>O&amp;bserver:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Any animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Any observer</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(none recorded)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 of %2 encounters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Search encounters and notes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Shows the encounters whose animal ids, behaviour, group, observer or note contain this text (upper or lower case alike)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::EntryKeys</name>
    <message>
        <source>On the line</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save the line (it is in the file at once)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Clear the line; leave a changed row as it was</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>In the day&apos;s table</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Put the row on the line to change it</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Delete the selected rows (one undoable step)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>In the refused lines</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Put the refused line back on the line</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Anywhere in the entry</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Undo the last line (not the letters of a field)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Redo the line undone last</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the date (2026-10-05 or 20261005; Enter goes on to the line)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the observer</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the time</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the winner</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the loser</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Mark the line a draw, or not</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the behaviour (here Alt+H is not the Help menu; F1 opens help)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the note</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the refused lines</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>End the session and show its summary</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Take back this session&apos;s lines, after a question</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the winner&apos;s supporters (ids separated by spaces)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To the loser&apos;s supporters (ids separated by spaces)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::FigureExportButton</name>
    <message>
        <source>Export</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save the plot as a journal figure (one column, 85 mm, or two columns, 175 mm; PNG at 300 dpi, SVG or PDF) with a caption line naming group, window, method and parameters, or copy it</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>One-Column Figure (85 mm)...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Two-Column Figure (175 mm)...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Copy to Clipboard</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>PNG image, 300 dpi (*.png)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>SVG drawing (*.svg)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>PDF document (*.pdf)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Export Figure</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Export Failed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 could not be written.</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::HealthView</name>
    <message>
        <source>Animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Encounters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Days seen</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Last seen</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Too few for a rank</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo interval width</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observer</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Days</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Month</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animals</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Since</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Days unseen</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Shared days</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Matched</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Only first</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Only second</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Agreeing</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Agreement</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cohen&apos;s kappa</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>first record</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>From:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Not seen for more than (days):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Fewest encounters for a rank:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Match within (min):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Not seen</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observers</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Months</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observer agreement</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(every group)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>too few</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Fewer than %1 encounters in the window: this animal&apos;s rank is not stable.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(none recorded)</source>
        <translation type="unfinished"></translation>
    </message>
    <message numerus="yes">
        <source>%n resident animal(s) not seen for more than %1 days on %2. </source>
        <translation type="unfinished">
            <numerusform></numerusform>
            <numerusform></numerusform>
        </translation>
    </message>
    <message>
        <source>the data health</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>last record</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (the window&apos;s last day)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (today)</source>
        <translation type="unfinished"></translation>
    </message>
    <message numerus="yes">
        <source>%1 (the file&apos;s last day of records, %n day(s) before today)</source>
        <translation type="unfinished">
            <numerusform></numerusform>
            <numerusform></numerusform>
        </translation>
    </message>
    <message>
        <source>%1 (the file&apos;s last day of records, today)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::HelpBrowser</name>
    <message>
        <source>Hierloom Help</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Back</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Forward</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Contents</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Methods</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Import Formats</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Shortcuts</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Keys</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Menu command</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::HelpButton</name>
    <message>
        <source>Open the help on this</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>What is %1? Opens its definition in the help.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Help</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Help on %1</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::HelpMenu</name>
    <message>
        <source>&amp;Help</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Hierloom &amp;Help</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Methods and Figures</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Keyboard Shortcuts</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Import File Formats</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open the &amp;Demo Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;About Hierloom</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>About &amp;Qt</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::HelpTopic</name>
    <message>
        <source>Which encounters, in which order</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo rating</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Optimised k</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Randomised Elo</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>David&apos;s score</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Normalised David&apos;s score</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Steepness</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Steepness test</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>I&amp;SI order</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Win matrix</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Landau&apos;s h</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Improved linearity h&apos;</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Linearity test</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Directional consistency</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Triangle transitivity</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Transitivity test</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Matrilineal rank prediction</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Conformity</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Discordant pairs</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Kendall&apos;s tau-b</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank acquisition</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Maternal relative rank</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Sex ratio of births</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Offspring sex and maternal rank</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Fisher&apos;s exact test</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Wilson interval</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Counter-dominance</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank changes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severe aggression</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Coefficient of relatedness</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rule-informed Elo</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Active and passive rank changes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Foresight of the rule and Elo</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Kin support and the nepotism index</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Data health</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::HierarchyPlotsView</name>
    <message>
        <source>the monthly hierarchy figures</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>h&apos;</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Steepness</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>t_tri</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Conformity</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Encounters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>h&apos; (de Vries 1995)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>steepness (David&apos;s score, Dij)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>triangle transitivity t_tri</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>conformity with the inheritance rule (Elo)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>encounters per month</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Month</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Month by month over the whole record of</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Every group&apos;s encounters, or one group&apos;s (an encounter without a group counts for the group both animals shared that day)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>all groups</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The hierarchy month by month</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>calendar months; months without encounters left empty</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>conformity of %1 ranks with youngest ascendancy, females from %2 years</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (%2)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>, width %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>from %1 to %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>up to %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>; and %1 more (hover)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Every animal with encounters %1 has at least %2.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 Too few encounters for a stable rank (under %2 %3); encounters and randomised-Elo interval width%4: %5.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> (widths being computed)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ImportAssistantDialog</name>
    <message>
        <source>&amp;Date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Winner:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Loser:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Actor:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Recipient:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Behaviour:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Group column:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Save Mapping</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Import</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Import a Spreadsheet</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>a CSV or TSV file saved from the spreadsheet</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>winner and loser columns</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>actor, recipient and an outcome code</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>ids</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>names</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>decided by the file&apos;s dates</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>year-month-day (2023-10-05)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>day/month/year (05/10/2023 = 5 October)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>month/day/year (10/05/2023 = 5 October)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>found from the header</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>comma</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>tab</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>semicolon</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>one group for the whole file (when no column holds it)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>codes, separated by commas</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>S&amp;heet:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Sa&amp;ved mapping:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Mapping name:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>La&amp;yout:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animals &amp;named by:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Date &amp;order:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>One group for the &amp;file:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Loss codes (recipient won):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Draw codes:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Columns</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>How the sheet is written</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Line</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Date</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Time</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Winner</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Loser</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Outcome</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Problem</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Name in the sheet</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rows</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animal id</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Add as new animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Sex of a new animal (F, M, U)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Close</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The first rows as they will be imported:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Names that match no animal: give the id of the animal they are, or tick &quot;Add as new animal&quot; and give the new animal&apos;s id and sex:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(a new mapping)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Spreadsheet to import</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>CSV or TSV (*.csv *.tsv *.txt);;All files (*)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 cannot be read (no such file, or no permission to read it).</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(not in the sheet)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose the sheet to import.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose the date order: %1 (line %2), and no date of the sheet reads only one way.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Dates read as %1: &apos;%2&apos; (line %3) reads no other way.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Dates read as %1 (every date reads the same either way).</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The dates fit none of the forms YYYY-MM-DD, DD/MM/YYYY, MM/DD/YYYY throughout.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Dates read as %1, as chosen.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>But &apos;%1&apos; (line %2) can only be %3.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Every row passes: %1 encounters and %2 new animals would be imported.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Nothing was imported; the colony is unchanged.
</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Imported %1 encounters and %2 new animals.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The mapping is not complete:
</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Saved the mapping as &quot;%1&quot; in the colony file.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Time:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>O&amp;utcome:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Obs&amp;erver:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Note:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Browse...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save the mapping under this name with the import</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Chec&amp;k</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Se&amp;parator:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Win &amp;codes (actor won):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Saved in the same write as the records: a refused import saves nothing.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rows read without a problem: %1. Check tests them against the import&apos;s rules without writing; Import writes them.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Nothing was imported and the mapping was not saved; the colony is unchanged.
</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ImportDialog</name>
    <message>
        <source>Import CSV Files</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose the files to add to the colony. Each is optional; the import is all or nothing: if any row is wrong, nothing is written.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Animals:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Residences:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Encounters:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Problems found in the files are listed here.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Import problems</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Import</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>not imported</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Browse...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>CSV files (*.csv);;All files (*)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No colony is open for writing; nothing was imported.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony file could not be written; nothing was imported.
%1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>... and %1 more problems not listed; fix these first.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Problems found: %1. Nothing was imported.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Imported %1 animals, %2 residences and %3 encounters.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony could not be read back: %1</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::LifeEventDialog</name>
    <message>
        <source>Record Death</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record Removal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Move Between Groups</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Animal:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To &amp;group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No animal chosen.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&apos;%1&apos; is not an animal of the colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose the animal.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record the death of %1 on %2?</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Record the removal of %1 from the colony on %2?</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose the group to move to.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Move %1 to group %2 on %3?</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ListEditorDialog</name>
    <message>
        <source>Behaviour Codes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observers</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Code</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severity (0-5)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Description</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Name or initials</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Add</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Remove</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::LoadProgress</name>
    <message>
        <source>Read Every Group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Reads every group&apos;s encounters in the background, for views of all groups (a large centre takes several seconds and much more memory).</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 of %2 groups read</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Reading every group&apos;s encounters…</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>A large colony opens with one group; views of all groups fill in when every one is read.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Groups in memory: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>This centre is read group by group as views turn to them; &quot;All groups&quot; covers only the groups in memory until every group is read.</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::MainWindow</name>
    <message>
        <source>Hierloom colonies (*.hierloom);;All files (*)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Save the Change</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;File</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;New Colony...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Open...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open &amp;Read-Only...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Ctrl+Shift+O</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open Re&amp;cent</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Import CSV...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Ctrl+I</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Close</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Quit</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;View</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;%1 %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(none)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>C&amp;lear List</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Open Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 could not be read: %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Open the Demo Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Create Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>New Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open Colony Read-Only</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Hierloom</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No colony open</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (read-only)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 - Hierloom</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animals: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Encounters: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Analysis</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Analysis &amp;Settings...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Undo history cleared: %1.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Undone: %1.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Redone: %1.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Import &amp;Spreadsheet...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Plot Background</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Light</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Dark</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Cannot Read the Whole Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Encounters: %1 read so far</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::MatrixView</name>
    <message>
        <source>the matrix</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>All groups</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Order by:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>From:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Loser</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Winner</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No encounters in this window.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>wins (cell shade, square-root scale)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>wins against the order (below the diagonal)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 animals, %2 encounters counted; ordered by %3; %4 cells with wins against the order.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 beat %2: %3
%2 beat %1: %4</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>
(wins against the order)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>animal id</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Order of rows and columns; the command line&apos;s `matrix` uses the same default (%1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Fit</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Show the whole matrix (the mouse wheel zooms, dragging moves)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Zoom in</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Zoom out</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Win matrix (rows: winners, columns: losers)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>ordered by %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 animals</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>crosses: wins against the order</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>one name (and total) in %1 shown where rows are narrow</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Won (row total)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Lost (column total)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (%2)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 after a name: fewer than %2 encounters in the window (rank not stable)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::MergeDialog</name>
    <message>
        <source>No file chosen</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Records edited differently in the two files</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Decide nothing: do not merge</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Keep &amp;this colony&apos;s version</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Take the &amp;other file&apos;s version</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Merge Another Colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Choose File...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Merge</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Hierloom colonies (*.hierloom);;All files (*)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open a colony for writing first.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>This is the colony already open; choose another file.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Merging would add:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Added:</source>
        <translation type="unfinished"></translation>
    </message>
    <message numerus="yes">
        <source>  %n animal(s)</source>
        <translation type="unfinished">
            <numerusform></numerusform>
            <numerusform></numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <source>  %n stay(s) in groups</source>
        <translation type="unfinished">
            <numerusform></numerusform>
            <numerusform></numerusform>
        </translation>
    </message>
    <message numerus="yes">
        <source>  %n encounter(s)</source>
        <translation type="unfinished">
            <numerusform></numerusform>
            <numerusform></numerusform>
        </translation>
    </message>
    <message>
        <source>Already here, skipped: %1 animals, %2 stays, %3 encounters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>  + animal %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>  taken from the other file: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Records that cannot be added:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose the other colony file; nothing is written until you press Merge.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Edited only in the other file, would be taken (%1):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Edited only in the other file, taken (%1):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Deleted in the other file, would be deleted here (%1):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Deleted in the other file, deleted here (%1):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Deleted here, stay deleted (%1):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Recognised by their content under another uid (%1):</source>
        <translation type="unfinished"></translation>
    </message>
    <message numerus="yes">
        <source>Changed differently in both files since they parted (%n):</source>
        <translation type="unfinished">
            <numerusform></numerusform>
            <numerusform></numerusform>
        </translation>
    </message>
    <message>
        <source>    %1: here &apos;%2&apos;, in the other file &apos;%3&apos;</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>, before &apos;%1&apos;</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony was backed up first into %1</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::PedigreeView</name>
    <message>
        <source>%1 (%2)%3</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>, present</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Line of %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Zoom to Fit Width</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Actual Size</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Zoom In</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Zoom Out</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Zoom to Fit</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::PlannerView</name>
    <message>
        <source>no adult male</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save As...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Delete</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Matriline</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Before</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>After</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted move</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted above</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted below</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed wins above</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed wins below</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Already predicted so before</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Scenario A</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Scenario B</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>New</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Print...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save PDF...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Saved:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Orders and Groups</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted Moves</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Relationships to Reverse</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Compare</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>A:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>B:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save Scenario</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Name:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(being composed)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony is open read-only</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No saved scenario named %1.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The saved scenario no longer fits the record:
%1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony has no group with encounters.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>yes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>no</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Relationships to Reverse (%1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animals %1 -&gt; %2; adult females/males %3/%4 -&gt; %5/%6; adult sex ratio (F:M) %7 -&gt; %8; matrilines %9 -&gt; %10</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>#</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed now (Elo)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted after</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Move</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> (new)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>the scenario being composed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1: %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 %2 females</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 %2: %3; %4 observed relationships to reverse</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(unsaved)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Save Scenario as PDF</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>PDF (*.pdf)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 days to %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed wins above
(%1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed wins below
(%1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Adult females only. Observed wins: decided encounters between the two in the %1 up to the scenario&apos;s date.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 days</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Adult females only (at least %1 years old on %2): the rule predicts their order.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted Moves (adult females)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Adult females only (at least %1 years old on %2); observed order by Elo.</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::PredictionView</name>
    <message>
        <source>the prediction</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Youngest ascendancy</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Eldest first</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rule:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed above</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed below</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Category</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank (1 = top)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed (Elo)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (%2)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No ranked females on this date.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 ranked females, %2 with an observed rank. Discordant dyads: %3 of %4 comparable; conformity %5, Kendall&apos;s tau-b %6.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>undefined</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>in a discordant dyad</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>concordant</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Order on %1 (%2)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>line of %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted and observed order of the females</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>on %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>rule: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>observed: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>females from %1 years</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&lt;b&gt;How much does inheritance explain?&lt;/b&gt;</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>How much does inheritance explain: foresight of each model per year</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Whole record, every group; rule alone, plain Elo and rule-informed Elo (docs: Foresight)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Model</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Log-lik.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Per enc.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Brier</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Pred.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The model</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Log-likelihood: the sum of ln p over the winners (higher is better)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Log-likelihood per encounter (a coin: -0.693)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Brier score: the mean of (1 - p) squared (lower is better; a coin: 0.25)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Share of winners given more than 1/2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Winners predicted</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Year</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rule-informed Elo</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rule alone</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1%</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 of %2 winners given more than 1/2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No decided encounters.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Every decided encounter of the record, each model&apos;s chance for its winner beforehand. The %1 rule could compare %2 of %3; the animal it places higher won %4 of them (its fitted win probability). A coin scores %5 per encounter and a Brier score of 0.25.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>none</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ProgressStrip</name>
    <message>
        <source>Cancel</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Compute Again</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Computing %1...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Failed: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Failed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Stopped; the view shows nothing new.</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::RankFlagWatch</name>
    <message>
        <source>Elo interval width: being computed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo interval width %1 points</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo interval width: not rated</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 Too few encounters for a stable rank: %2 in the window (threshold %3); %4</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Encounters in the window: %1 (threshold %2); %3</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 after a name: fewer than %2 encounters in the window, rank not stable (flagged: %3); hover a name for its encounters and randomised-Elo interval width%4.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> (widths being computed)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::RankTimelineView</name>
    <message>
        <source>Birth</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Maturity</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Introduction</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Removal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Death</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>the rank timeline</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo rating</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Monthly</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Weekly</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>All ages</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Young adults (under 8)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Prime (8 to 15)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Old (16 and over)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>All matrilines</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>All groups</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Show:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Date</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Line of %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>In a discordant dyad</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Observed rank (1 = top)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (%2)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Date: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>none (no rating yet)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Predicted rank: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo rating: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Matriline: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Discordant dyads: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Discordance: selected female</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Discordance: all females</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Discordance: none</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Changes: plain</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Changes: active/passive</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Mark each change of rank between checkpoints: active (won or lost among the females ranked before and after), passive (females above her left or entered), or both</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Ranks over time</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank change: active</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank change: passive</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank change: both</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>from %1 to %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>up to %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 On %2, %3 of %4 females shown have fewer than %5 encounters %6: ringed, their ranks are not stable; hover the point at that date for its encounters and randomised-Elo interval width%7.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> (widths being computed)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 Too few encounters (at the date)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::RecordHistoryDialog</name>
    <message>
        <source>added</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>changed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>removed</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>imported</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>restored from backup</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;History...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>History of %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>When</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Who</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Action</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Changes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>(another program)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No changes are recorded for %1.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>encounter %1 over %2 on %3</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ReportDialog</name>
    <message>
        <source>Hierarchy Report</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>At:</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ResearchExportDialog</name>
    <message>
        <source>Spreadsheet-friendly (UTF-8 byte-order mark in each file)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Export Research Tables</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Whole window as one period</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Days</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Weeks</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Months</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Years</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Custom windows</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>One window per line: YYYY-MM-DD,YYYY-MM-DD</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>All groups</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>YYYY-MM-DD (empty: from the start)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>YYYY-MM-DD (empty: to the end)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Randomisations of the per-period tests in the metrics table (0: tests skipped)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Browse...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Periods:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Custom windows:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank method:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>From:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Randomisations:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Folder:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Export</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Gestation length and maturity age come from the colony&apos;s species setting (Sex Ratio tab).</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Folder for the Research Tables</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1: &apos;%2&apos; is not a date YYYY-MM-DD.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>From</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>To</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>From is after To.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Custom window &apos;%1&apos; is not FROM,TO with two dates YYYY-MM-DD, FROM not after TO.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Enter at least one custom window, or choose regular periods.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony&apos;s species setting is not valid: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose a folder for the tables.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1.csv (%2 rows)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Wrote %1 files to %2:
%3</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The tables could not be written: %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Export &amp;Research Tables...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Data health in the rank table (encounters, too few for a stable rank)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Ends ranks_by_period with encounters and few_encounters (fewer than %1 encounters behind the rank), as export-tables --health</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ScenarioComposer</name>
    <message>
        <source>youngest ascendancy</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>eldest first</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Starting date:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Sibling rule:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Remove an animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Introduce an unrelated female</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Add an expected birth</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Split: move whole matrilines to a new group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Animal:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>new id, e.g. NEW1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>New female&apos;s id:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>female</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>male</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>unknown</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>optional; default new-1, new-2, ...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Mother:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Sex:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Id:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Matrilines that move (each whole, named by its matriarch):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>New group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>e.g. South Pen</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Add Change</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Remove Selected Change</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Changes (applied in order; the records are never changed)</source>
        <translation type="unfinished"></translation>
    </message>
    <message numerus="yes">
        <source>%1 (%n resident member(s))</source>
        <translation type="unfinished">
            <numerusform></numerusform>
            <numerusform></numerusform>
        </translation>
    </message>
    <message>
        <source>Remove %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Introduce unrelated female %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Expected birth: %1 of %2%3</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>daughter</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>son</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>infant</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> (id %1)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Split: lines of %1 move to %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>NEW%1</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::SexRatioView</name>
    <message>
        <source>Save Species Setting</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (%2)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> days</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> years</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Store the species, gestation length and maturity age in the colony file</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Species:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Gestation:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Females ranked from:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Offspring</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Mother</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Born</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Reason left out</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Figures</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Proportion of sons by maternal rank third</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Births left out</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Maternal rank at conception and at birth</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Proportion of sons</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Wilson 95 % interval</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Low
(rel. rank &lt; 1/3)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Middle
(1/3 to &lt; 2/3)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>High
(2/3 and above)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Mother&apos;s relative rank at conception</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony&apos;s species setting is not valid (%1); the default species applies.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>All groups</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Figure</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Value</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No colony is open.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No births with a recorded birth date: every figure is empty.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 births used, %2 left out.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No birth could be used: every figure is empty.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The offspring are all of one sex: the logistic regression is undefined.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The logistic regression is undefined (fewer than two births, one maternal rank only, or complete separation).</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Proportion of sons by the mother&apos;s rank third at conception</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>births from %1 (founders excluded): %2 used</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>the record&apos;s start</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1, gestation %2 days, females ranked from %3 years</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>mother&apos;s relative %1 rank at conception</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>bars: Wilson 95 % intervals</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Births are counted from the record&apos;s first encounter, %1; %2 founders and %3 animals born before then are not births.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1
%2 sons
of %3 births</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::StabilityBadge</name>
    <message>
        <source>Stability alert: %1</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::StabilityThresholdsDialog</name>
    <message>
        <source>Stability Thresholds</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> %</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>off</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source> x median</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Counter-dominance share above</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>... over at least (decided encounters)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>... with at least this many between two matrilines, per week</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank change per animal above</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severe behaviour: severity at least</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severe encounters per animal-day above</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>... with at least (severe encounters)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Defaults: counter-dominance above %1 % over at least %2 decided encounters with at least %3 a week between the same two matrilines; severe (severity %4 or more) above %5 times the record&apos;s median rate with at least %6 in the period; rank changes off. Kept in the colony file.</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::StabilityView</name>
    <message>
        <source>Counter-dominance</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank changes</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severe aggression</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Thresholds...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Weeks</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Months</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Per:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Period</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Signal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Value</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Evidence</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Choose an alert to see its evidence: the dyads and dates behind it.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Stability Thresholds (read-only colony: not saved)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>The colony is open read-only: thresholds cannot be saved</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>counter-dominance share</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>severe per animal-day / median</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>rank change per animal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Stability alert for %1 in the latest period (%2 - %3): %4. See the evidence below.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>, </source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severe encounters (date, winner, loser, behaviour):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Counter-dominant dyads (winner below loser before the encounter; matrilines; dates):</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Stability watch</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>severe: behaviour severity %1 or more; dashed: alert thresholds</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severe rate, times the median: severe encounters per animal-day in the period divided by the median of that rate over the group&apos;s periods of the same length (1 = a usual period). Dashed lines: alert thresholds; red dots: periods that raised an alert; periods without encounters are left empty.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Counter-
dominance
share</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Severe rate,
times the
median</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Mean rank
change per
animal</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::SupportView</name>
    <message>
        <source>&amp;Group:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Permutations:</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Support matrix (row for column: given/opportunities)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Pairs</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Daughters&apos; rise</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Rank figures use the winner and the loser only; supporters enter these figures alone (docs/methods.md, &quot;Kin support&quot;).</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>every group</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 encounters, no supporters recorded.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 encounters, %2 support acts. Rate of mothers for their offspring %3, of pairs with r &lt; 0.125 %4; nepotism index %5, permutation p %6 (%7 permutations, seed %8). Mothers&apos; acts for a daughter against a female the rule puts below her: %9 of %10.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>line</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>matriline of %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>the support figures</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::TypedDate</name>
    <message>
        <source>Type the date as YYYY-MM-DD or YYYYMMDD</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&apos;%1&apos; is not a real date; type it as YYYY-MM-DD or YYYYMMDD</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::ViewRegistry</name>
    <message>
        <source>&amp;Animals</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Encounters</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Timeline</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Prediction</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Matrix</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Hierarchy</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Se&amp;x Ratio</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Evening E&amp;ntry</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>P&amp;lanner</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Stability</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Supp&amp;ort</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Data Health</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Centre Overview</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::WelcomePanel</name>
    <message>
        <source>Recent colonies</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Explore the demo colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>A made-up group of monkeys with seven years of records. It opens as a read-only copy, so nothing you do can break it.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Create a new colony</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>An empty colony file for your own animals and encounters.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Import CSV files</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Make a new colony from spreadsheet files of animals, groups and encounters.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Open a Colony File...</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>&amp;Help</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1   (%2)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Welcome to Hierloom</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Hierloom keeps the records of an animal colony and shows who ranks above whom. New here? Start with the demo colony.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>No colony is open</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open a recent colony (double-click it), or choose below.</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>hierloom::ui::caption</name>
    <message>
        <source>draws ignored</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>draws count half to each</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>all groups</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>group %1</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 to %2</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>start of record</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>end of record</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Elo rating (k %1, start %2, %3 curve, %4)</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>normal</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>logistic</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>%1 (%2)</source>
        <translation type="unfinished"></translation>
    </message>
</context>
<context>
    <name>main</name>
    <message>
        <source>Hierloom: dominance ranks and their inheritance in animal colonies.
Without a colony file it opens on a start screen that offers the demo colony.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>A colony file (.hierloom) to open.</source>
        <translation type="unfinished"></translation>
    </message>
    <message>
        <source>Open on this view: %1.</source>
        <translation type="unfinished"></translation>
    </message>
</context>
</TS>
