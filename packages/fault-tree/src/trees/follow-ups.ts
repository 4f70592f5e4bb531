// Follow-up actions shared by the shipped trees' outcomes.

export const followUps = {
  purgeAndRecheck:
    'After refilling and bleeding as the maker describes, drive or run the engine at full operating temperature for ten minutes or more, let it cool, then recheck the level and top it up: it drops a little as trapped air leaves (common practice).',
  leakCheckAfterDrive:
    'Once the engine has cooled after that drive, look again for leaks at every joint that was disturbed.',
  labelTimingCover:
    'If the pump sat behind the timing belt: renew the belt, tensioner and idlers with it as the maker specifies, replace single-use bolts, and put a label with the mileage and date of the belt job on the timing cover.',
  roadTestConfirm:
    'Road-test under the conditions the customer described (traffic, motorway, load, A/C on) with live data logged, and confirm the temperature stays in its normal band.',
  tellAdvisor:
    'Give the service advisor the readings that led to this finding so they can explain it to the customer.',
} as const;
